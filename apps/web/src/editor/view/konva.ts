/*
 * The editor draws with Konva's core and the shapes it uses, not the whole library (filters,
 * paths, transformers, text on paths...): a smaller editor chunk that evaluates sooner. Every
 * react-konva import of the editor goes through here; a new shape needs its konva/lib/shapes
 * import below (without it Konva reports the shape as unknown).
 */
import "konva/lib/shapes/Arc";
import "konva/lib/shapes/Line";
import "konva/lib/shapes/Arrow";
import "konva/lib/shapes/Circle";
import "konva/lib/shapes/Rect";
import "konva/lib/shapes/Text";

export { Arc, Arrow, Circle, Group, Layer, Line, Rect, Stage, Text } from "react-konva/lib/ReactKonvaCore";
