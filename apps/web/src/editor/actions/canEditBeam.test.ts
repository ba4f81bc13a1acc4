import { describe, expect, it } from "vitest";
import { ids, twoSpanDocument } from "../commands/testDocument";
import { EditorStore } from "../store/EditorStore";
import { canEditBeam, editorActions, findAction } from "./editorActions";

// Which actions a read-only role (viewer, checker) keeps: only those that look, never those that change the beam.
const lookingActions = ["escape", "tool-select", "tool-pan", "fit", "zoom-in", "zoom-out"];

function readOnlyStore(): EditorStore {
  const store = new EditorStore(twoSpanDocument(), { canEdit: false });
  store.setUi({ selection: { kind: "node", id: ids.n1 } });
  return store;
}

describe("canEditBeam", () => {
  it("is true by default and false for a store opened read-only", () => {
    expect(canEditBeam(new EditorStore(twoSpanDocument()).getState())).toBe(true);
    expect(canEditBeam(new EditorStore(twoSpanDocument(), { canEdit: false }).getState())).toBe(false);
  });
});

describe("enabled predicates for a read-only role", () => {
  it.each(editorActions.filter((a) => !lookingActions.includes(a.id)).map((a) => [a.id]))("%s is disabled", (id) => {
    expect(findAction(id).isEnabled(readOnlyStore().getState())).toBe(false);
  });

  it.each(lookingActions.filter((id) => id !== "escape").map((id) => [id]))("%s stays enabled", (id) => {
    expect(findAction(id).isEnabled(readOnlyStore().getState())).toBe(true);
  });

  it("escape still clears a selection", () => {
    expect(findAction("escape").isEnabled(readOnlyStore().getState())).toBe(true);
  });

  it.each([["tool-point-load"], ["tool-support-pinned"], ["add-span"], ["add-load-case"], ["toggle-hinge"], ["delete"]])(
    "%s is enabled again once the role may edit",
    (id) => {
      const store = readOnlyStore();
      store.setUi({ canEdit: true });
      expect(findAction(id).isEnabled(store.getState())).toBe(true);
    },
  );

  it("undo is disabled for a read-only role even with history", () => {
    const store = new EditorStore(twoSpanDocument());
    findAction("add-span").run(store);
    expect(findAction("undo").isEnabled(store.getState())).toBe(true);
    store.setUi({ canEdit: false });
    expect(findAction("undo").isEnabled(store.getState())).toBe(false);
  });
});
