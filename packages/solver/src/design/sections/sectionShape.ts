import { z } from "zod";

/**
 * Parametric cross-sections, dimensions in metres. Bending is about the horizontal (strong) axis;
 * "top" is the compression side under sagging moment. Every shape is doubly or singly symmetric
 * about the vertical axis, so only the width at each depth matters for strong-axis properties.
 */
const length = (what: string) =>
  z.number({ error: `${what} must be a number` }).finite(`${what} must be finite`).positive(`${what} must be greater than zero`);

export const rectangleShapeSchema = z.object({
  kind: z.literal("rectangle"),
  /** Width, m. */ b: length("width b"),
  /** Depth, m. */ h: length("depth h"),
});

export const circleShapeSchema = z.object({
  kind: z.literal("circle"),
  /** Diameter, m. */ d: length("diameter d"),
});

export const hollowCircleShapeSchema = z.object({
  kind: z.literal("hollow-circle"),
  /** Outside diameter, m. */ d: length("outside diameter d"),
  /** Wall thickness, m. */ t: length("wall thickness t"),
});

export const boxShapeSchema = z.object({
  kind: z.literal("box"),
  /** Overall width, m. */ b: length("width b"),
  /** Overall depth, m. */ h: length("depth h"),
  /** Top and bottom flange (wall) thickness, m. */ tf: length("flange thickness tf"),
  /** Thickness of each of the two webs, m. */ tw: length("web thickness tw"),
});

const flangedFields = {
  /** Overall depth, m. */ d: length("depth d"),
  /** Flange width, m. */ bf: length("flange width bf"),
  /** Flange thickness, m. */ tf: length("flange thickness tf"),
  /** Web thickness, m. */ tw: length("web thickness tw"),
};

/** Doubly symmetric I/H; root fillets are ignored (tables include them, so A and I come out ~2–4 % low). */
export const iShapeSchema = z.object({ kind: z.literal("i-shape"), ...flangedFields });

/** Channel bent about its axis of symmetry (the strong axis), so its properties match an I of the same plates. */
export const channelShapeSchema = z.object({ kind: z.literal("channel"), ...flangedFields });

/** Tee: flange on top by default; `flange-bottom` is the inverted tee. */
export const teeShapeSchema = z.object({
  kind: z.literal("tee"),
  ...flangedFields,
  orientation: z.enum(["flange-top", "flange-bottom"]).default("flange-top"),
});

/** User-typed properties, for sections the parametric shapes do not cover. */
export const customShapeSchema = z.object({
  kind: z.literal("custom"),
  /** Area, m². */ A: length("area A"),
  /** Second moment of area about the bending axis, m⁴. */ I: length("second moment of area I"),
  /** Overall depth, m. */ depth: length("depth"),
  /** Centroid below the top fibre, m; defaults to depth/2 (symmetric section). */
  yTop: length("centroid from top").optional(),
  /** Plastic modulus, m³, if known. */ Z: length("plastic modulus Z").optional(),
  /** First moment of area at the neutral axis, m³, if known. */ Q: length("first moment Q").optional(),
  /** Width at the neutral axis, m, if known. */ bNA: length("width at neutral axis").optional(),
  /** Shear area for Timoshenko beams, m², if known. */ shearArea: length("shear area").optional(),
});

export const sectionShapeSchema = z.discriminatedUnion("kind", [
  rectangleShapeSchema,
  circleShapeSchema,
  hollowCircleShapeSchema,
  boxShapeSchema,
  iShapeSchema,
  channelShapeSchema,
  teeShapeSchema,
  customShapeSchema,
]);

export type SectionShape = z.output<typeof sectionShapeSchema>;
export type SectionShapeInput = z.input<typeof sectionShapeSchema>;
export type SectionKind = SectionShape["kind"];
export type IShape = z.output<typeof iShapeSchema>;
