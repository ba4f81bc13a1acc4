import { describe, expect, it } from "vitest";
import { twoSpanDocument, ids } from "../commands/testDocument";
import { hitTest } from "./hitTest";
import { BEAM_Y, layoutScene } from "./sceneLayout";

// Camera: x = 0 m at 50 px, 50 px per metre, so node 1 (6 m) is at 350 px and the point load
// (9 m) at 500 px.
const camera = { originX: -1, scale: 50 };

describe("hit-testing the scene", () => {
  const doc = twoSpanDocument();
  const layout = layoutScene(doc, camera, null);
  const point = layout.loads.find((l) => l.id === ids.point)!;
  const udl = layout.loads.find((l) => l.id === ids.udl)!;

  it.each<[string, number, number, unknown]>([
    ["a node on the beam", 352, BEAM_Y + 3, { kind: "node", id: ids.n1 }],
    ["the beam between nodes", 200, BEAM_Y, { kind: "segment", id: ids.s0 }],
    ["the point-load arrow", 501, point.kind === "point" ? (point.top + point.bottom) / 2 : 0, { kind: "load", id: ids.point }],
    ["the distributed block", 120, udl.kind === "distributed" ? udl.base - 3 : 0, { kind: "load", id: ids.udl }],
    ["empty canvas", 200, 10, null],
    ["right of the beam", 700, BEAM_Y, null],
  ])("finds %s", (_t, px, py, expected) => {
    expect(hitTest(layout, px, py)).toEqual(expected);
  });

  it("hides loads of filtered-out cases", () => {
    const filtered = layoutScene(doc, camera, new Set([ids.live]));
    expect(filtered.loads).toHaveLength(0);
    expect(hitTest(filtered, 501, BEAM_Y - 40)).toBeNull();
  });

  it("scales arrows with magnitude and places nodes by camera", () => {
    expect(layout.nodes.map((n) => n.px)).toEqual([50, 350, 650]);
    expect(point.kind === "point" && point.bottom - point.top).toBe(70); // the only (largest) force
  });
});
