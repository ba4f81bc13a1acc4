import type { Camera } from "./camera";

/** Rounds x (m) to the nearest multiple of step (m); a non-positive step means no grid. The extra
 * rounding removes float noise so 0.1-step values stay exactly typeable (0.30000000000000004 → 0.3). */
export function snapToGrid(x: number, step: number): number {
  if (!(step > 0) || !Number.isFinite(x)) return x;
  return Number((Math.round(x / step) * step).toPrecision(12));
}

/**
 * Snaps to the nearest feature (a node, a load end) within `tolerancePx` on screen, else to the
 * grid. Features win because landing exactly on a support matters more than a round number.
 */
export function snapX(x: number, options: { camera: Camera; step: number; features: readonly number[]; tolerancePx?: number }): number {
  const tolerance = (options.tolerancePx ?? 8) / options.camera.scale;
  let best: number | null = null;
  for (const f of options.features) {
    if (Math.abs(f - x) <= tolerance && (best === null || Math.abs(f - x) < Math.abs(best - x))) best = f;
  }
  return best ?? snapToGrid(x, options.step);
}

/** Grid positions visible in [x0, x1], thinned so lines sit at least `minGapPx` apart. */
export function gridLines(camera: Camera, widthPx: number, step: number, minGapPx = 12): number[] {
  if (!(step > 0)) return [];
  let s = step;
  while (s * camera.scale < minGapPx) s *= 5;
  const x0 = camera.originX;
  const x1 = camera.originX + widthPx / camera.scale;
  const first = Math.ceil(x0 / s);
  const last = Math.floor(x1 / s);
  const lines: number[] = [];
  for (let i = first; i <= last && lines.length < 2000; i++) lines.push(Number((i * s).toPrecision(12)));
  return lines;
}

/** Default grid steps: 0.1 m in SI, 3 in in US customary (0.0762 m exactly). */
export const defaultGridStep = { si: 0.1, us: 0.0762 } as const;
