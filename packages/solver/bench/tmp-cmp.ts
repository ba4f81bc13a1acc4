import { solve } from "../src/index.js";
import { interactiveModel, generateBeam } from "./models.js";
import { writeFileSync } from "node:fs";
let seed = 12345; const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
const models: any[] = [interactiveModel()];
for (let m = 0; m < 60; m++) {
  const spans = 1 + Math.floor(rnd() * 7);
  const L = spans * 6;
  const loads = () => Array.from({ length: 1 + Math.floor(rnd() * 3) }, () => rnd() < 0.5 ? { type: "point" as const, x: Math.round(rnd() * L * 4) / 4, fy: -1e4 * rnd() } : { type: "distributed" as const, x1: 0, x2: L, qy1: -1e4 * rnd(), qy2: 1e4 * (rnd() - 0.7) });
  const base = generateBeam(spans, [
    { id: "D", category: "dead", loads: loads() },
    { id: "L", category: "live", pattern: true, loads: loads() },
    { id: "W", category: "wind", pattern: rnd() < 0.5, loads: loads() },
  ], { combinations: [{ id: "A", factors: { D: 1.2, L: 1.6 } }, { id: "B", factors: { D: 0.9, W: -1.0, L: 0.5 } }], stations: Array.from({ length: Math.floor(rnd() * 50) }, (_, i) => (i * L) / 49).filter((x) => x <= L) });
  models.push(base);
}
writeFileSync(process.env.OUT!, JSON.stringify(models.map((m) => solve(m))));
