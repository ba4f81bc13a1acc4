import { describe, expect, it } from "vitest";
import { createTemplate } from "../model/templates";
import { toExchange } from "../model/exchange";
import { clearDraft, readDraft, writeDraft } from "./draftStorage";
import { exportModelText, importModelText } from "./importModel";

function memoryStorage() {
  const map = new Map<string, string>();
  return { getItem: (k: string) => map.get(k) ?? null, setItem: (k: string, v: string) => void map.set(k, v), removeItem: (k: string) => void map.delete(k) };
}

describe("drafts", () => {
  it("keeps a draft with the version it was edited from, until cleared", () => {
    const store = memoryStorage();
    const model = toExchange(createTemplate("cantilever", "si"));
    writeDraft("k", { baseVersion: 3, savedAt: "2026-12-01T00:00:00Z", model }, store);
    expect(readDraft("k", store)).toEqual({ baseVersion: 3, savedAt: "2026-12-01T00:00:00Z", model });
    clearDraft("k", store);
    expect(readDraft("k", store)).toBeNull();
  });

  it("ignores a corrupt draft", () => {
    const store = memoryStorage();
    store.setItem("k", "{not json");
    expect(readDraft("k", store)).toBeNull();
  });
});

describe("JSON import and export", () => {
  it("exports and imports the same model", () => {
    const doc = createTemplate("three-spans-overhang", "si");
    const back = importModelText(exportModelText(doc), "si");
    expect(back.ok).toBe(true);
    if (back.ok) expect(toExchange(back.doc)).toEqual(toExchange(doc));
  });

  it.each([
    ["not JSON", "hello", "not JSON"],
    ["a wrong format", JSON.stringify({ format: "other" }), "Not a Spanwright beam model"],
  ])("explains %s", (_t, text, message) => {
    const result = importModelText(text, "si");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain(message);
  });
});
