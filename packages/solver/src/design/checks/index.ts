export * from "./checkResult.js";
export * from "./deflectionCheck.js";
export * from "./stressChecks.js";
export * from "./designMethod.js";
export * from "./aiscCb.js";
export * from "./aiscCompactness.js";
export * from "./aiscF2.js";
export * from "./aiscG2.js";
