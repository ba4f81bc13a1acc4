export * from "./combinationTypes.js";
export * from "./asce7Presets.js";
export * from "./en1990Presets.js";
export * from "./generateCombinations.js";
