import type { CombinationTemplate, LoadCategory, Slot, Term } from "./combinationTypes.js";

/** EN 1990:2002+A1 Table A1.2(B): γG,sup = 1.35, γG,inf = 1.00, γQ = 1.50. */
export const EN1990_GAMMA = { Gsup: 1.35, Ginf: 1.0, Q: 1.5 } as const;

export type ImposedLoadCategory = "A-D" | "E";
export type SnowSite = "altitude-up-to-1000m" | "above-1000m-or-nordic";

export interface En1990Options {
  /** Table A1.1: categories A (domestic), B (office), C (congregation), D (shopping): ψ0 = 0.7; E (storage): 1.0. */
  readonly imposed: ImposedLoadCategory;
  /** Table A1.1: snow at sites H ≤ 1000 m a.s.l.: ψ0 = 0.5; H > 1000 m, or Finland, Iceland, Norway, Sweden: 0.7. */
  readonly snowSite: SnowSite;
}

/**
 * ψ0 from EN 1990:2002+A1 Table A1.1. Roof live load is imposed category H (roofs), ψ0 = 0;
 * wind ψ0 = 0.6. Rain, earthquake, settlement and other have no ψ0 in eq. 6.10 and are not placed.
 */
export function psi0(category: LoadCategory, options: En1990Options): number | null {
  switch (category) {
    case "live":
      return options.imposed === "E" ? 1.0 : 0.7;
    case "roof-live":
      return 0;
    case "snow":
      return options.snowSite === "above-1000m-or-nordic" ? 0.7 : 0.5;
    case "wind":
      return 0.6;
    case "dead":
    case "rain":
    case "earthquake":
    case "settlement":
    case "other":
      return null;
  }
}

export const EN1990_VARIABLE: readonly LoadCategory[] = ["live", "roof-live", "snow", "wind"];

const t = (category: LoadCategory, factor: number): Term => ({ category, factor });
const always = (...alternatives: Term[]): Slot => ({ alternatives, required: false });
const needs = (...alternatives: Term[]): Slot => ({ alternatives, required: true });

const symbol: Record<LoadCategory, string> = {
  dead: "G", live: "Q,imp", "roof-live": "Q,roof", snow: "Q,snow", rain: "Q,rain", wind: "Q,wind",
  earthquake: "AEd", settlement: "Gset", other: "Q,other",
};

/**
 * Eq. 6.10: Σ γG·Gk + γQ,1·Qk,1 + Σ γQ,i·ψ0,i·Qk,i. One template per leading variable action and
 * per permanent factor (γG,sup when permanent actions are unfavourable, γG,inf when favourable,
 * applied to all permanent cases together per Table A1.2(B) Note 3). Accompanying actions are all
 * taken as unfavourable; delete them where they relieve the effect (γQ = 0 when favourable).
 */
export function en1990Templates(options: En1990Options): CombinationTemplate[] {
  const templates: CombinationTemplate[] = [
    { number: "0", expression: `${EN1990_GAMMA.Gsup}G`, slots: [needs(t("dead", EN1990_GAMMA.Gsup))] },
  ];
  EN1990_VARIABLE.forEach((lead, i) => {
    // EN 1991-1-1 §3.3.2(1): imposed roof loads need not act together with snow or wind.
    const excluded = (c: LoadCategory) => lead === "roof-live" && (c === "snow" || c === "wind");
    const accompanying = EN1990_VARIABLE.filter((c) => c !== lead && !excluded(c) && (psi0(c, options) ?? 0) > 0);
    for (const [suffix, gammaG] of [["", EN1990_GAMMA.Gsup], ["f", EN1990_GAMMA.Ginf]] as const) {
      const parts = [`${gammaG}G`, `${EN1990_GAMMA.Q}${symbol[lead]}`,
        ...accompanying.map((c) => `${EN1990_GAMMA.Q}·${psi0(c, options)}${symbol[c]}`)];
      templates.push({
        number: `${i + 1}${suffix}`,
        expression: parts.join(" + "),
        slots: [
          always(t("dead", gammaG)),
          needs(t(lead, EN1990_GAMMA.Q)),
          ...accompanying.map((c) => always(t(c, EN1990_GAMMA.Q * (psi0(c, options) ?? 0)))),
        ],
      });
    }
  });
  return templates;
}
