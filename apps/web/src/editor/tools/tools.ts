import type { ToolId } from "../store/uiState";
import { panTool } from "./pan/panTool";
import { placeHingeTool } from "./placeHinge/placeHingeTool";
import { placeLoadTool } from "./placeLoad/placeLoadTool";
import { placeSupportTool } from "./placeSupport/placeSupportTool";
import { selectTool } from "./select/selectTool";
import { splitTool } from "./split/splitTool";
import type { Tool } from "./Tool";

export const toolsById: Record<ToolId, Tool> = {
  select: selectTool,
  pan: panTool,
  "place-support": placeSupportTool,
  "place-hinge": placeHingeTool,
  "place-load": placeLoadTool,
  split: splitTool,
};
