import { describe, expect, it } from "vitest";
import { describeScheduleLoad } from "./describeScheduleLoad";
import { FT_M, KIP_N, unitsFor } from "./reactionUnits";

describe("describeScheduleLoad", () => {
  it.each([
    [{ type: "point", x: 3, fy: -12_000 }, "si", "point -12 kN at 3 m"],
    [{ type: "moment", x: 6, mz: 15_000 }, "si", "moment 15 kN·m at 6 m"],
    [{ type: "distributed", x1: 0, x2: 6, qy1: -3000, qy2: -3000 }, "si", "distributed -3 kN/m from 0 m to 6 m"],
    [{ type: "distributed", x1: 0, x2: 6, qy1: -3000, qy2: -5000 }, "si", "distributed -3..-5 kN/m from 0 m to 6 m"],
    // 1 kip at 10 ft, exact factors (NIST SP 811, appendix B).
    [{ type: "point", x: 10 * FT_M, fy: -KIP_N }, "us", "point -1 kip at 10 ft"],
    [{ type: "distributed", x1: 0, x2: 20 * FT_M, qy1: -2 * KIP_N / FT_M, qy2: -2 * KIP_N / FT_M }, "us", "distributed -2 kip/ft from 0 ft to 20 ft"],
    [{ type: "settlement", node: 1, uy: -0.01 }, "si", "settlement -10 mm at node 1"],
  ] as const)("%o in %s reads %s", (load, system, text) => {
    expect(describeScheduleLoad(load, unitsFor(system))).toBe(text);
  });
});
