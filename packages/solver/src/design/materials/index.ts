export * from "./material.js";
export * from "./materialPresets.js";
export * from "./concreteModulus.js";
