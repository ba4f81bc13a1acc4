export * from "./exchange.js";
export * from "./units.js";
export * from "./reactionTable.js";
export * from "./csv.js";
export * from "./loadSchedule.js";
