import type { CombinationTemplate, Slot, Term } from "./combinationTypes.js";

const t = (category: Term["category"], factor: number, companionLive?: true): Term =>
  companionLive ? { category, factor, companionLive } : { category, factor };
const always = (...alternatives: Term[]): Slot => ({ alternatives, required: false });
const needs = (...alternatives: Term[]): Slot => ({ alternatives, required: true });

/**
 * ASCE/SEI 7-22 §2.3.1, basic combinations for strength design (LRFD). In 7-22 the snow load S
 * is a strength-level (reliability-targeted) load: it takes 1.0 where it leads (Maguire et al.,
 * "Ground Snow Loads for ASCE 7-22", STRUCTURE magazine, Feb. 2022). Its companion factors, 0.3
 * in place of 0.5 and 0.15 with earthquake, are from memory and must be verified against the
 * standard. E stands for Eh + Ev taken together as one modelled case.
 */
export const ASCE7_22_STRENGTH: readonly CombinationTemplate[] = [
  { number: "1", expression: "1.4D", slots: [needs(t("dead", 1.4))] },
  {
    number: "2",
    expression: "1.2D + 1.6L + 0.5(Lr or R) or 0.3S",
    slots: [always(t("dead", 1.2)), needs(t("live", 1.6)), always(t("roof-live", 0.5), t("snow", 0.3), t("rain", 0.5))],
  },
  {
    number: "3",
    expression: "1.2D + 1.6(Lr or R) or 1.0S + (L or 0.5W)",
    slots: [always(t("dead", 1.2)), needs(t("roof-live", 1.6), t("snow", 1.0), t("rain", 1.6)), always(t("live", 1.0, true), t("wind", 0.5))],
  },
  {
    number: "4",
    expression: "1.2D + 1.0W + L + 0.5(Lr or R) or 0.3S",
    slots: [always(t("dead", 1.2)), needs(t("wind", 1.0)), always(t("live", 1.0, true)), always(t("roof-live", 0.5), t("snow", 0.3), t("rain", 0.5))],
  },
  { number: "5", expression: "0.9D + 1.0W", slots: [always(t("dead", 0.9)), needs(t("wind", 1.0))] },
  {
    number: "6",
    expression: "1.2D + Ev + Eh + L + 0.15S",
    slots: [always(t("dead", 1.2)), needs(t("earthquake", 1.0)), always(t("live", 1.0, true)), always(t("snow", 0.15))],
  },
  { number: "7", expression: "0.9D − Ev + Eh", slots: [always(t("dead", 0.9)), needs(t("earthquake", 1.0))] },
];

/**
 * ASCE/SEI 7-22 §2.4.1, basic combinations for allowable stress design: W enters at 0.6, E at
 * 0.7, and the strength-level snow load at 0.7 (the 0.7S in combinations 3, 4 and 6a is quoted in
 * "ASCE 7-22 Flat Roof Snow Load versus Minimum Snow Load", STRUCTURE magazine; the 0.75(0.7S)
 * in 6b by analogy, from memory). Tornado loads WT (new in 7-22) have no load category here.
 */
export const ASCE7_22_ALLOWABLE: readonly CombinationTemplate[] = [
  { number: "1", expression: "D", slots: [needs(t("dead", 1.0))] },
  { number: "2", expression: "D + L", slots: [always(t("dead", 1.0)), needs(t("live", 1.0))] },
  {
    number: "3",
    expression: "D + (Lr or 0.7S or R)",
    slots: [always(t("dead", 1.0)), needs(t("roof-live", 1.0), t("snow", 0.7), t("rain", 1.0))],
  },
  {
    number: "4",
    expression: "D + 0.75L + 0.75(Lr or 0.7S or R)",
    slots: [always(t("dead", 1.0)), needs(t("live", 0.75)), needs(t("roof-live", 0.75), t("snow", 0.525), t("rain", 0.75))],
  },
  { number: "5", expression: "D + (0.6W or 0.7E)", slots: [always(t("dead", 1.0)), needs(t("wind", 0.6), t("earthquake", 0.7))] },
  {
    number: "6a",
    expression: "D + 0.75L + 0.75(0.6W) + 0.75(Lr or 0.7S or R)",
    slots: [always(t("dead", 1.0)), needs(t("wind", 0.45)), always(t("live", 0.75)), always(t("roof-live", 0.75), t("snow", 0.525), t("rain", 0.75))],
  },
  {
    number: "6b",
    expression: "D + 0.75L + 0.75(0.7E) + 0.75(0.7S)",
    slots: [always(t("dead", 1.0)), needs(t("earthquake", 0.525)), always(t("live", 0.75)), always(t("snow", 0.525))],
  },
  { number: "7", expression: "0.6D + 0.6W", slots: [always(t("dead", 0.6)), needs(t("wind", 0.6))] },
  { number: "8", expression: "0.6D + 0.7E", slots: [always(t("dead", 0.6)), needs(t("earthquake", 0.7))] },
];

export const ASCE7_LIVE_EXCEPTION_NOTE =
  "ASCE/SEI 7-22 §2.3.1 Exception 1: the factor on L in combinations 3, 4 and 6 may be 0.5 for occupancies with " +
  "Lo ≤ 100 psf (4.79 kN/m²) in Table 4.3-1, except garages and places of public assembly. Choose it explicitly.";
