import type { SectionKind, SectionShape } from "@spanwright/solver/design";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { editableDesign, fromDesignDisplay, type DesignQuantity } from "./designUnits";

export interface ShapeField {
  readonly key: string;
  readonly label: string;
  readonly quantity: DesignQuantity;
  readonly optional?: boolean;
}

export const SHAPE_LABELS: Record<SectionKind, string> = {
  rectangle: "Solid rectangle",
  circle: "Solid circle",
  "hollow-circle": "Hollow circle (tube)",
  box: "Hollow rectangle (box)",
  "i-shape": "I / H (doubly symmetric)",
  channel: "Channel",
  tee: "Tee",
  custom: "Custom (type A, I and depths)",
};

export const SECTION_KINDS = Object.keys(SHAPE_LABELS) as SectionKind[];

const flanged: readonly ShapeField[] = [
  { key: "d", label: "Depth d", quantity: "dimension" },
  { key: "bf", label: "Flange width bf", quantity: "dimension" },
  { key: "tf", label: "Flange thickness tf", quantity: "dimension" },
  { key: "tw", label: "Web thickness tw", quantity: "dimension" },
];

export const SHAPE_FIELDS: Record<SectionKind, readonly ShapeField[]> = {
  rectangle: [
    { key: "b", label: "Width b", quantity: "dimension" },
    { key: "h", label: "Depth h", quantity: "dimension" },
  ],
  circle: [{ key: "d", label: "Diameter d", quantity: "dimension" }],
  "hollow-circle": [
    { key: "d", label: "Outside diameter d", quantity: "dimension" },
    { key: "t", label: "Wall thickness t", quantity: "dimension" },
  ],
  box: [
    { key: "b", label: "Width b", quantity: "dimension" },
    { key: "h", label: "Depth h", quantity: "dimension" },
    { key: "tf", label: "Flange thickness tf", quantity: "dimension" },
    { key: "tw", label: "Web thickness tw (each)", quantity: "dimension" },
  ],
  "i-shape": flanged,
  channel: flanged,
  tee: flanged,
  custom: [
    { key: "A", label: "Area A", quantity: "area" },
    { key: "I", label: "Second moment I", quantity: "secondMoment" },
    { key: "depth", label: "Depth", quantity: "dimension" },
    { key: "yTop", label: "Centroid from top", quantity: "dimension", optional: true },
    { key: "Z", label: "Plastic modulus Z", quantity: "sectionModulus", optional: true },
    { key: "Q", label: "First moment Q at NA", quantity: "sectionModulus", optional: true },
    { key: "bNA", label: "Width at NA", quantity: "dimension", optional: true },
    { key: "shearArea", label: "Shear area", quantity: "area", optional: true },
  ],
};

/** Invented starting dimensions (SI), so a new section shows properties at once. */
export const DEFAULT_SHAPES: Record<SectionKind, SectionShape> = {
  rectangle: { kind: "rectangle", b: 0.2, h: 0.4 },
  circle: { kind: "circle", d: 0.3 },
  "hollow-circle": { kind: "hollow-circle", d: 0.2, t: 0.01 },
  box: { kind: "box", b: 0.2, h: 0.3, tf: 0.01, tw: 0.01 },
  "i-shape": { kind: "i-shape", d: 0.4, bf: 0.18, tf: 0.012, tw: 0.008 },
  channel: { kind: "channel", d: 0.3, bf: 0.09, tf: 0.012, tw: 0.008 },
  tee: { kind: "tee", d: 0.2, bf: 0.2, tf: 0.012, tw: 0.01, orientation: "flange-top" },
  custom: { kind: "custom", A: 0.01, I: 1e-4, depth: 0.4 },
};

export type FieldText = Readonly<Record<string, string>>;

/** The shape's values as editable display-unit strings. */
export function fieldTextOf(shape: SectionShape, system: UnitSystemId): FieldText {
  const values = shape as unknown as Record<string, unknown>;
  const text: Record<string, string> = {};
  for (const f of SHAPE_FIELDS[shape.kind]) {
    const v = values[f.key];
    text[f.key] = typeof v === "number" ? editableDesign(v, system, f.quantity) : "";
  }
  return text;
}

/**
 * Raw input for `sectionProperties` (SI): blank optional fields are left out, anything not a
 * number becomes NaN so the engine's validation names the field.
 */
export function shapeInputOf(kind: SectionKind, text: FieldText, system: UnitSystemId, orientation?: string): Record<string, unknown> {
  const input: Record<string, unknown> = { kind };
  for (const f of SHAPE_FIELDS[kind]) {
    const raw = (text[f.key] ?? "").trim();
    if (raw === "" && f.optional) continue;
    const n = raw === "" ? Number.NaN : Number(raw);
    input[f.key] = fromDesignDisplay(n, system, f.quantity);
  }
  if (kind === "tee") input.orientation = orientation ?? "flange-top";
  return input;
}

/** Re-expresses typed values in another unit system; text that is not a number is kept as typed. */
export function convertFieldText(kind: SectionKind, text: FieldText, from: UnitSystemId, to: UnitSystemId): FieldText {
  const next: Record<string, string> = { ...text };
  for (const f of SHAPE_FIELDS[kind]) {
    const raw = (text[f.key] ?? "").trim();
    const n = Number(raw);
    if (raw !== "" && Number.isFinite(n)) next[f.key] = editableDesign(fromDesignDisplay(n, from, f.quantity), to, f.quantity);
  }
  return next;
}
