// Canvas colours from the app's tokens (styles.css): Konva draws to a canvas and cannot read CSS
// variables, so the few it needs are repeated here.
export const colors = {
  ink: "#17253d",
  inkSoft: "#56709c",
  paper: "#fbfaf7",
  grid: "#e8e3d8",
  dimension: "#6a6458",
  selection: "#bf8a2a",
  selectionFill: "rgba(217, 164, 65, 0.18)",
  danger: "#a63d2a",
  dangerFill: "rgba(166, 61, 42, 0.14)",
  hover: "#8198bd",
} as const;

/** Muted per-case colours, by the case's position in the list. */
const caseColors = ["#2c4368", "#9c6d1f", "#2f6b43", "#85301f", "#56709c", "#7a531b", "#4f4a41"];

export function caseColor(index: number): string {
  return caseColors[((index % caseColors.length) + caseColors.length) % caseColors.length]!;
}
