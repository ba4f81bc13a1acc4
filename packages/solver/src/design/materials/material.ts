import { z } from "zod";
import { fromZodIssues, ok, type DesignResult } from "../result.js";

const positive = (what: string) =>
  z.number({ error: `${what} must be a number` }).finite(`${what} must be finite`).positive(`${what} must be greater than zero`);

export const materialKindSchema = z.enum(["steel", "concrete", "timber", "custom"]);
export type MaterialKind = z.infer<typeof materialKindSchema>;

/**
 * A material as the engineer sees it: SI units (Pa, kg/m³). Presets are templates to copy and
 * edit; `typical: true` marks values that must be confirmed for the project.
 */
export const materialSchema = z.object({
  id: z.string().min(1, "id is required"),
  name: z.string().min(1, "name is required"),
  kind: materialKindSchema,
  /** Modulus of elasticity, Pa. */ E: positive("modulus of elasticity E"),
  /** Shear modulus, Pa. */ G: positive("shear modulus G").optional(),
  /** Poisson's ratio. */ nu: z.number().min(0, "Poisson's ratio must be at least 0").lt(0.5, "Poisson's ratio must be below 0.5").optional(),
  /** Specified minimum yield stress, Pa (steel). */ Fy: positive("yield stress Fy").optional(),
  /** Specified minimum tensile strength, Pa (steel). */ Fu: positive("tensile strength Fu").optional(),
  /** Specified compressive strength f'c, Pa (concrete). */ fc: positive("compressive strength f'c").optional(),
  /** Density, kg/m³. */ density: positive("density").optional(),
  typical: z.boolean(),
  /** Shown beside the values, e.g. "typical values, confirm for your project". */
  note: z.string(),
  /** Where each value comes from. */
  source: z.string(),
});

export type Material = z.infer<typeof materialSchema>;

export const TYPICAL_NOTE = "typical values, confirm for your project";

/** Validates a user-entered material; errors name the field. */
export function validateMaterial(input: unknown): DesignResult<Material> {
  const parsed = materialSchema.safeParse(input);
  return parsed.success ? ok(parsed.data) : fromZodIssues(parsed.error.issues);
}

export interface CustomMaterialInput {
  readonly id: string;
  readonly name: string;
  readonly E: number;
  readonly G?: number;
  readonly nu?: number;
  readonly Fy?: number;
  readonly density?: number;
}

/**
 * A user-defined material. Where G is absent but ν is given, G = E / (2(1 + ν)) (isotropic
 * elasticity); values are the user's own, so `typical` is false.
 */
export function createCustomMaterial(input: CustomMaterialInput): DesignResult<Material> {
  const G = input.G ?? (input.nu !== undefined ? input.E / (2 * (1 + input.nu)) : undefined);
  return validateMaterial({
    ...input,
    ...(G !== undefined ? { G } : {}),
    kind: "custom",
    typical: false,
    note: "values entered by the user",
    source: "user",
  });
}

/** Copies a preset into an editable project material under a new id; values and the typical flag are kept. */
export function materialFromPreset(preset: Material, id: string, name?: string): Material {
  return { ...preset, id, name: name ?? preset.name };
}
