import { describe, expect, it } from "vitest";
import { viewsOf, workArray } from "./workBuffers.js";

describe("workArray", () => {
  it("hands the same array out again up to 1 M numbers, and never keeps a larger one", () => {
    const kept = { array: new Float64Array(0) };
    const first = workArray(1000, kept);
    expect(first.length).toBe(1000);
    expect(workArray(500, kept)).toBe(first);
    const large = workArray((1 << 20) + 1, kept);
    expect(large.length).toBe((1 << 20) + 1);
    expect(kept.array).toBe(first);
  });
});

describe("viewsOf", () => {
  it("hands out zeroed, disjoint views, a new buffer when one is full", () => {
    const take = viewsOf(10);
    const a = take(4);
    const b = take(6);
    a.fill(1);
    expect(Array.from(b)).toEqual([0, 0, 0, 0, 0, 0]);
    expect(a.buffer).toBe(b.buffer);
    const c = take(3);
    expect(c.buffer).not.toBe(a.buffer);
    expect(take(25).length).toBe(25); // longer than a chunk: a buffer of its own
  });
});
