export * from "./roles.js";
export * from "./errors.js";
export * from "./auth.js";
export * from "./projects.js";
export * from "./beams.js";
export * from "./routes.js";
