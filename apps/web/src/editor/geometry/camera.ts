// The canvas's horizontal camera: world x in metres to screen x in CSS pixels. The beam's vertical
// placement is fixed by the layout, so only x needs a camera; every diagram shares the same one,
// which is what keeps them aligned under the beam.

export interface Camera {
  /** World x (m) shown at screen x = 0. */
  readonly originX: number;
  /** Pixels per metre; always finite and within [MIN_SCALE, MAX_SCALE]. */
  readonly scale: number;
}

export const MIN_SCALE = 0.5; // px/m: a 2 km beam still fits a 1000 px canvas
export const MAX_SCALE = 20000; // px/m: 1 mm spans 20 px

export const defaultCamera: Camera = { originX: -1, scale: 60 };

export function worldToScreenX(camera: Camera, x: number): number {
  return (x - camera.originX) * camera.scale;
}

export function screenToWorldX(camera: Camera, px: number): number {
  return px / camera.scale + camera.originX;
}

function clampScale(scale: number): number {
  if (!Number.isFinite(scale) || scale <= 0) return MIN_SCALE;
  return Math.min(MAX_SCALE, Math.max(MIN_SCALE, scale));
}

/** Zooms by `factor` keeping the world point under screen x `anchorPx` still (wheel zoom). */
export function zoomAt(camera: Camera, factor: number, anchorPx: number): Camera {
  const scale = clampScale(camera.scale * factor);
  const anchor = screenToWorldX(camera, anchorPx);
  return { scale, originX: anchor - anchorPx / scale };
}

export function panBy(camera: Camera, dxPx: number): Camera {
  return { ...camera, originX: camera.originX - dxPx / camera.scale };
}

/** A camera showing [x0, x1] across `widthPx` with `marginPx` each side. A zero-length range
 * (or a too-narrow view) falls back to a sane scale rather than dividing by zero. */
export function fitCamera(x0: number, x1: number, widthPx: number, marginPx = 60): Camera {
  const usable = Math.max(widthPx - 2 * marginPx, 1);
  const length = x1 - x0;
  const scale = clampScale(length > 0 ? usable / length : defaultCamera.scale);
  const centre = (x0 + x1) / 2;
  return { scale, originX: centre - widthPx / 2 / scale };
}
