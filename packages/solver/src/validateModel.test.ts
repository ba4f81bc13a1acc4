import { describe, expect, it } from "vitest";
import type { BeamModelInput } from "./beamModelSchema.js";
import { formatPath, validateModel } from "./validateModel.js";

const steel = { E: 2e11, I: 8e-5 };

function base(): BeamModelInput {
  return {
    format: "spanwright.beam/1",
    nodes: [{ x: 0, support: { type: "pinned" } }, { x: 6, support: { type: "pinned" } }, { x: 10 }],
    segments: [{ ...steel }, { ...steel }],
    loadCases: [{ id: "D", category: "dead", loads: [{ type: "point", x: 3, fy: -1000 }] }],
    combinations: [{ id: "C1", factors: { D: 1.4 } }],
  };
}

type Edit = (m: BeamModelInput) => unknown;

describe("validateModel", () => {
  it("accepts a valid model and applies the defaults", () => {
    const result = validateModel({ format: "spanwright.beam/1", nodes: [{ x: 0, support: { type: "fixed" } }, { x: 2 }], segments: [steel] });
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.value).toMatchObject({ theory: "euler-bernoulli", loadCases: [], combinations: [] });
  });

  it.each<{ name: string; edit: Edit; where: string; message: RegExp }>([
    { name: "not an object", edit: () => 42, where: "(model)", message: /expected object/i },
    { name: "wrong format", edit: (m) => ({ ...m, format: "other/1" }), where: "format", message: /format/ },
    { name: "a negative I", edit: (m) => (m.segments[1]!.I = -1, m), where: "segments[1].I", message: /segments\[1\]\.I/ },
    { name: "an infinite E", edit: (m) => (m.segments[0]!.E = Infinity, m), where: "segments[0].E", message: /segments\[0\]\.E/ },
    { name: "an unknown key", edit: (m) => ({ ...m, nodes: [{ x: 0, hindge: true }, ...m.nodes.slice(1)] }), where: "nodes[0]", message: /unknown field.*hindge/ },
    { name: "one node", edit: (m) => ({ ...m, nodes: [{ x: 0 }] }), where: "nodes", message: /nodes/ },
    { name: "x not increasing", edit: (m) => (m.nodes[2]!.x = 6, m), where: "nodes[2].x", message: /strictly increase/ },
    { name: "too few segments", edit: (m) => ({ ...m, segments: [steel] }), where: "segments", message: /expected 2 segments/ },
    { name: "a hinge at an end", edit: (m) => (m.nodes[2]!.hinge = true, m), where: "nodes[2].hinge", message: /end of the beam/ },
    {
      name: "a hinge on a fixed support",
      edit: (m) => (m.nodes[1] = { x: 6, hinge: true, support: { type: "fixed" } }, m),
      where: "nodes[1].hinge",
      message: /restrains rotation/,
    },
    { name: "a spring with no stiffness", edit: (m) => (m.nodes[2]!.support = { type: "spring", ky: 0 }, m), where: "nodes[2].support", message: /ky or kr/ },
    { name: "Timoshenko without A", edit: (m) => ({ ...m, theory: "timoshenko" }), where: "segments[0].A", message: /Timoshenko theory needs A/ },
    {
      name: "a point load beyond the beam",
      edit: (m) => (m.loadCases![0]!.loads[0] = { type: "point", x: 11, fy: 1 }, m),
      where: "loadCases[0].loads[0].x",
      message: /outside the beam/,
    },
    {
      name: "a distributed load with x1 >= x2",
      edit: (m) => (m.loadCases![0]!.loads[0] = { type: "distributed", x1: 4, x2: 2, qy1: 1, qy2: 1 }, m),
      where: "loadCases[0].loads[0].x2",
      message: /x1 < x2/,
    },
    {
      name: "a settlement on an unsupported node",
      edit: (m) => (m.loadCases![0]!.loads[0] = { type: "settlement", node: 2, uy: -0.01 }, m),
      where: "loadCases[0].loads[0].node",
      message: /restrains uy/,
    },
    {
      name: "a settlement on a missing node",
      edit: (m) => (m.loadCases![0]!.loads[0] = { type: "settlement", node: 9, uy: -0.01 }, m),
      where: "loadCases[0].loads[0].node",
      message: /does not exist/,
    },
    { name: "a duplicate case id", edit: (m) => (m.loadCases!.push({ id: "D", category: "live", loads: [] }), m), where: "loadCases[1].id", message: /used twice/ },
    { name: "a combination reusing a case id", edit: (m) => (m.combinations![0]!.id = "D", m), where: "combinations[0].id", message: /already used/ },
    { name: "a combination of a missing case", edit: (m) => (m.combinations![0]!.factors = { L: 1 }, m), where: "combinations[0].factors.L", message: /"L", which does not exist/ },
    { name: "a station beyond the beam", edit: (m) => ({ ...m, stations: [1, -2] }), where: "stations[1]", message: /outside the beam/ },
    { name: "an unknown category", edit: (m) => (((m.loadCases![0] as { category: string }).category = "traffic"), m), where: "loadCases[0].category", message: /category/ },
  ])("rejects $name with where = $where", ({ edit, where, message }) => {
    const result = validateModel(edit(base()));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error.code).toBe("invalid-model");
    expect(result.error.where).toBe(where);
    expect(result.error.message).toMatch(message);
  });
});

describe("formatPath", () => {
  it.each([
    { path: ["segments", 2, "I"], expected: "segments[2].I" },
    { path: ["loadCases", 0, "loads", 3, "x"], expected: "loadCases[0].loads[3].x" },
    { path: [], expected: "(model)" },
  ])("formats $path as $expected", ({ path, expected }) => {
    expect(formatPath(path)).toBe(expected);
  });
});
