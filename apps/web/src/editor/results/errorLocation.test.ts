import { describe, expect, it } from "vitest";
import { twoSpanDocument } from "../commands/testDocument";
import { locateError } from "./errorLocation";

describe("locating engine errors on the beam", () => {
  const doc = twoSpanDocument();
  it.each<[string, string, string, unknown]>([
    ["mechanism x range", "mechanism", "nodes 1 to 2 (x = 6 m to 12 m)", { x1: 6, x2: 12 }],
    ["a node path", "invalid-model", "nodes[1].hinge", { x1: 6, x2: 6 }],
    ["a segment path", "invalid-model", "segments[1].I", { x1: 6, x2: 12 }],
    ["a load path", "invalid-model", "loadCases[0].loads[1].x", { x1: 9, x2: 9 }],
    ["a path with no place", "invalid-model", "combinations[0].factors.Q", null],
  ])("%s", (_t, code, where, expected) => {
    expect(locateError({ code: code as "mechanism", message: "", where }, doc)).toEqual(expected);
  });
});
