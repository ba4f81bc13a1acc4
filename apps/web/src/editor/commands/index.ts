export * from "./DocChange";
export * from "./nodeCommands";
export * from "./segmentCommands";
export * from "./loadCommands";
export * from "./caseCommands";
export * from "./documentCommands";
export * from "./history";
export * from "./designCommands";
