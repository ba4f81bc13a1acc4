/** LRFD uses φ·Rn ≥ Ru; ASD uses Rn/Ω ≥ Ra (AISC 360-22 §B3.1, §B3.2). */
export type DesignMethod = "LRFD" | "ASD";

export function availableStrength(nominal: number, method: DesignMethod, phi: number, omega: number): number {
  return method === "LRFD" ? phi * nominal : nominal / omega;
}

export function strengthFormula(method: DesignMethod, symbol: string, phi: number, omega: number): string {
  return method === "LRFD" ? `φ·${symbol} with φ = ${phi.toFixed(2)}` : `${symbol}/Ω with Ω = ${omega.toFixed(2)}`;
}
