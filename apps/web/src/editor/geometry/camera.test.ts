import { describe, expect, it } from "vitest";
import { fitCamera, MAX_SCALE, MIN_SCALE, panBy, screenToWorldX, worldToScreenX, zoomAt, type Camera } from "./camera";
import { gridLines, snapToGrid, snapX } from "./snapping";

const camera: Camera = { originX: -1, scale: 50 };

describe("camera transforms", () => {
  it.each([0, 1, 6.5, -2, 123.456])("world %d m maps to screen and back", (x) => {
    expect(screenToWorldX(camera, worldToScreenX(camera, x))).toBeCloseTo(x, 12);
  });

  it("puts originX at the left edge and scales by px per metre", () => {
    expect(worldToScreenX(camera, -1)).toBe(0);
    expect(worldToScreenX(camera, 1)).toBe(100);
  });

  it.each([2, 0.5, 10])("zooming by %d keeps the point under the cursor still", (factor) => {
    const anchorPx = 317;
    const before = screenToWorldX(camera, anchorPx);
    const zoomed = zoomAt(camera, factor, anchorPx);
    expect(screenToWorldX(zoomed, anchorPx)).toBeCloseTo(before, 10);
    expect(zoomed.scale).toBeCloseTo(camera.scale * factor, 10);
  });

  it("clamps zoom to its limits", () => {
    expect(zoomAt(camera, 1e9, 0).scale).toBe(MAX_SCALE);
    expect(zoomAt(camera, 1e-9, 0).scale).toBe(MIN_SCALE);
  });

  it("pans with the pointer: dragging right moves the world right", () => {
    const moved = panBy(camera, 100);
    expect(worldToScreenX(moved, 1)).toBeCloseTo(200, 10);
  });

  it("fits a beam between the margins", () => {
    const fitted = fitCamera(0, 12, 1000, 50);
    expect(worldToScreenX(fitted, 0)).toBeCloseTo(50, 10);
    expect(worldToScreenX(fitted, 12)).toBeCloseTo(950, 10);
  });

  it("fits a zero-length range without dividing by zero", () => {
    const fitted = fitCamera(3, 3, 800);
    expect(Number.isFinite(fitted.scale)).toBe(true);
    expect(worldToScreenX(fitted, 3)).toBeCloseTo(400, 10);
  });
});

describe("snapping", () => {
  it.each([
    [0.34, 0.1, 0.3],
    [0.35000001, 0.1, 0.4],
    [6.04, 0.1, 6],
    [1.0, 0.0762, 0.9906], // 13 × 3 in
    [2.5, 0, 2.5],
  ])("%d on a %d m grid snaps to %d", (x, step, expected) => {
    expect(snapToGrid(x, step)).toBe(expected);
  });

  it("prefers a nearby node over the grid", () => {
    expect(snapX(6.07, { camera, step: 0.1, features: [6.05] })).toBe(6.05); // 1 px away at 50 px/m
    expect(snapX(6.5, { camera, step: 0.1, features: [6.05] })).toBe(6.5); // 22 px away: grid
  });

  it("thins grid lines when zoomed out", () => {
    const dense = gridLines({ originX: 0, scale: 1000 }, 1000, 0.1);
    const sparse = gridLines({ originX: 0, scale: 10 }, 1000, 0.1);
    expect(dense).toHaveLength(11);
    expect(sparse[1]! - sparse[0]!).toBeCloseTo(2.5, 10);
  });
});
