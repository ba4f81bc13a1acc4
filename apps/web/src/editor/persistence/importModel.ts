import { beamModelSchema } from "@spanwright/solver";
import type { BeamDocument } from "../model/BeamDocument";
import { fromExchange, toExchange, type ExchangeModel } from "../model/exchange";
import type { UnitSystemId } from "../units/unitSystems";

export type ImportResult = { readonly ok: true; readonly doc: BeamDocument } | { readonly ok: false; readonly message: string };

/**
 * Reads exchange-format JSON (a file the user picked, a saved revision, a draft) into a document.
 * The engine's schema is the judge of the format, so imports fail with its path, e.g. segments.2.I.
 */
export function importModel(json: unknown, units: UnitSystemId): ImportResult {
  const parsed = beamModelSchema.safeParse(json);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue?.path.join(".") ?? "";
    return { ok: false, message: `Not a Spanwright beam model${where ? ` (at ${where})` : ""}: ${issue?.message ?? "invalid"}` };
  }
  // Keep the caller's object (not the parsed one) so optional fields stay exactly as written.
  const result = fromExchange(json as ExchangeModel, units);
  return result.ok ? { ok: true, doc: result.doc } : { ok: false, message: `${result.error.message} (at ${result.error.where})` };
}

export function importModelText(text: string, units: UnitSystemId): ImportResult {
  try {
    return importModel(JSON.parse(text) as unknown, units);
  } catch {
    return { ok: false, message: "The file is not JSON." };
  }
}

/** Pretty-printed exchange JSON for download; SI units as the format requires. */
export function exportModelText(doc: BeamDocument): string {
  return `${JSON.stringify(toExchange(doc), null, 2)}\n`;
}

export function downloadText(fileName: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: "application/json" }));
  const a = document.createElement("a");
  a.href = url;
  a.download = fileName;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
