import { solve } from "../src/index.js";
import { interactiveModel } from "./models.js";
const input = interactiveModel();
for (let i = 0; i < 300; i++) solve(input);
const T: number[][] = []; (globalThis as any).T = T;
for (let i = 0; i < 1000; i++) solve(input);
for (let j = 0; j < 3; j++) { const s = T.map((r) => r[j]!).sort((a, b) => a - b); console.log(["parts", "combos", "rows"][j], s[500]!.toFixed(3), "p10", s[100]!.toFixed(3)); }
