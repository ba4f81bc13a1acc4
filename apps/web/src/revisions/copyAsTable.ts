import type { ProjectUnits } from "@spanwright/contracts";
import { describeColumn, type ReactionColumn, type ReactionSupportRow } from "./pivotReactions";
import { formatReaction, toDisplay } from "./reactionUnits";

/**
 * Tab-separated text for the clipboard: spreadsheets split it into cells on paste. Units ride in
 * the header so a pasted number is never without one; cells hold bare numbers so they stay numbers.
 */

/** Tabs and line breaks inside a cell would split it; spreadsheets read them as separators. */
function cell(text: string): string {
  return text.replace(/[\t\r\n]+/g, " ");
}

export function reactionTableToTsv(
  columns: readonly ReactionColumn[],
  rows: readonly ReactionSupportRow[],
  units: ProjectUnits,
): string {
  const header = [
    "Support",
    `x (${units.length.label})`,
    "Type",
    ...columns.map((c) => `${describeColumn(c)} (${units[c.unitKind].label})`),
    "Uplift",
  ];
  const lines = rows.map((r) => [
    r.label,
    String(Number(toDisplay(units, "length", r.x).toPrecision(12))),
    r.support,
    ...columns.map((c) => {
      const v = r.values[c.key];
      return v === undefined ? "" : formatReaction(units, c.unitKind, v);
    }),
    r.hasUplift ? "yes" : "no",
  ]);
  return [header, ...lines].map((line) => line.map(cell).join("\t")).join("\n");
}

/** Writes text to the clipboard; false when the browser refuses (no permission, insecure page). */
export async function copyText(
  text: string,
  clipboard: Pick<Clipboard, "writeText"> | null = (globalThis.navigator as Navigator | undefined)?.clipboard ?? null,
): Promise<boolean> {
  if (clipboard === null) return false;
  try {
    await clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}
