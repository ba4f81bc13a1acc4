import type { Tool } from "../Tool";
import { drawing } from "./drawing";
import { idle } from "./idle";

export const placeLoadTool: Tool = { id: "place-load", initial: "idle", states: [idle, drawing] };
