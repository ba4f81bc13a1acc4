export * from "./exchange.js";
export * from "./units.js";
export * from "./reactionTable.js";
