import type { Tool } from "../Tool";
import { draggingLoad } from "./draggingLoad";
import { draggingLoadEnd } from "./draggingLoadEnd";
import { draggingNode } from "./draggingNode";
import { idle } from "./idle";
import { pointing } from "./pointing";

export const selectTool: Tool = { id: "select", initial: "idle", states: [idle, pointing, draggingNode, draggingLoad, draggingLoadEnd] };
