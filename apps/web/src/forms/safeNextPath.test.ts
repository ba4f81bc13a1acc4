import { describe, expect, it } from "vitest";
import { safeNextPath } from "./safeNextPath";

describe("safeNextPath", () => {
  it.each([
    ["/projects/p1/beams/b2", "/projects/p1/beams/b2"],
    ["/projects?x=1", "/projects?x=1"],
    [null, "/projects"],
    ["", "/projects"],
    ["https://elsewhere.example", "/projects"],
    ["//elsewhere.example/path", "/projects"],
    ["/\\elsewhere.example", "/projects"],
    ["/sign-in?next=/projects", "/projects"],
  ])("sends %s to %s", (next, expected) => {
    expect(safeNextPath(next)).toBe(expected);
  });
});
