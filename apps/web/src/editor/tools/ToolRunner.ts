import type { Tool, PointerInput, StateData, ToolContext } from "./Tool";

/** Feeds pointer input to the active tool's current state and follows its transitions. */
export class ToolRunner {
  private tool: Tool;
  private stateId: string;
  private data: StateData = {};

  constructor(tool: Tool) {
    this.tool = tool;
    this.stateId = tool.initial;
  }

  /** "select.draggingNode": for tests and debugging. */
  get path(): string {
    return `${this.tool.id}.${this.stateId}`;
  }

  setTool(tool: Tool, ctx?: ToolContext): void {
    if (tool.id === this.tool.id) return;
    if (ctx && this.stateId !== this.tool.initial) this.handle({ type: "cancel", px: 0, py: 0, x: 0, target: null }, ctx);
    this.tool = tool;
    this.stateId = tool.initial;
    this.data = {};
  }

  handle(input: PointerInput, ctx: ToolContext): void {
    const state = this.tool.states.find((s) => s.id === this.stateId);
    if (!state) throw new Error(`tool ${this.tool.id} has no state ${this.stateId}`);
    const transition = state.onPointer(input, ctx, this.data);
    if (transition) {
      this.stateId = transition.to;
      this.data = transition.data ?? {};
    }
  }
}
