import type { KeyboardEvent } from "react";

const FOCUSABLE = "input, select, button";

// Plain child lists rather than tBodies/rows/cellIndex, which some DOM implementations lack.
function bodyRows(table: HTMLTableElement): HTMLElement[] {
  return Array.from(table.querySelectorAll<HTMLElement>(":scope > tbody > tr"));
}

function cellsOf(tr: Element): Element[] {
  return Array.from(tr.children).filter((c) => c.tagName === "TD" || c.tagName === "TH");
}

function cellControl(table: HTMLTableElement, row: number, col: number): HTMLElement | null {
  const tr = bodyRows(table)[row];
  const td = tr ? cellsOf(tr)[col] : undefined;
  return td?.querySelector<HTMLElement>(FOCUSABLE) ?? null;
}

/**
 * Spreadsheet keys for an editable table: ArrowUp/ArrowDown (and Enter, after the cell commits)
 * move to the same column in the next row; Ctrl+ArrowLeft/Right move across cells, since plain
 * arrows edit text. Tab keeps its native order. Attach to the table's onKeyDown.
 */
export function navigateGrid(e: KeyboardEvent<HTMLElement>): void {
  const target = e.target as HTMLElement;
  if (target.tagName === "SELECT" && !e.ctrlKey) return; // arrows choose options there
  const td = target.closest("td");
  const tr = td?.parentElement;
  const table = target.closest("table");
  if (!td || !tr || !table) return;
  const row = bodyRows(table).indexOf(tr);
  const col = cellsOf(tr).indexOf(td);
  if (row < 0 || col < 0) return;
  let next: HTMLElement | null = null;
  if (e.key === "ArrowDown" || (e.key === "Enter" && target.tagName === "INPUT" && !e.shiftKey)) next = cellControl(table, row + 1, col);
  else if (e.key === "ArrowUp" || (e.key === "Enter" && e.shiftKey)) next = cellControl(table, row - 1, col);
  else if (e.key === "ArrowRight" && e.ctrlKey) next = cellControl(table, row, col + 1);
  else if (e.key === "ArrowLeft" && e.ctrlKey) next = cellControl(table, row, col - 1);
  if (!next) return;
  e.preventDefault();
  // Let the current cell commit (blur) before the next takes focus.
  next.focus();
  if (next instanceof HTMLInputElement) next.select();
}

export const tableClasses = {
  table: "w-full border-collapse text-sm",
  head: "border-b border-paper-300 bg-paper-100 text-left text-xs font-semibold text-paper-700",
  th: "px-2 py-1 font-semibold",
  row: (selected: boolean) => `border-b border-paper-200 ${selected ? "bg-ochre-50" : "hover:bg-paper-50"}`,
  td: "px-2 py-1 align-middle",
  select: "w-full rounded-sm border border-paper-300 bg-white px-1 py-0.5 text-sm focus:outline-2 focus:outline-ochre-400",
  smallButton: "rounded-sm px-1.5 py-0.5 text-xs text-ink-700 hover:bg-paper-200 focus:outline-2 focus:outline-ochre-400",
  addButton: "rounded-sm border border-paper-300 bg-white px-2 py-1 text-xs font-medium text-ink-800 hover:bg-paper-50",
};
