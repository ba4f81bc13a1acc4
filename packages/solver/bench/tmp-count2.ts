import { interactiveModel } from "./models.js";
const counts = new Map<string, number>();
const Orig = Float64Array;
class Counting extends Orig { constructor(...args: any[]) { super(...(args as [])); if (typeof args[0] === "number" && args[0] * 8 > 64) { const where = new Error().stack!.split("\n")[2]!.trim(); counts.set(where, (counts.get(where) ?? 0) + 1); } } }
(globalThis as any).Float64Array = Counting;
const { solve } = await import("../src/index.js");
solve(interactiveModel());
counts.clear();
solve(interactiveModel());
for (const [k, v] of [...counts].sort((a, b) => b[1] - a[1])) console.log(v, k);
