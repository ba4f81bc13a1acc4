/**
 * Width-to-thickness classification for flexure, AISC 360-22 Table B4.1b:
 *   case 10, flanges of rolled I-shapes:  λ = bf/(2tf), λp = 0.38√(E/Fy), λr = 1.0√(E/Fy)
 *   case 15, webs of doubly symmetric I:  λ = h/tw,     λp = 3.76√(E/Fy), λr = 5.70√(E/Fy)
 */
export type Slenderness = "compact" | "noncompact" | "slender";

export interface ElementClass {
  readonly lambda: number;
  readonly lambdaP: number;
  readonly lambdaR: number;
  readonly class: Slenderness;
}

function classify(lambda: number, lambdaP: number, lambdaR: number): ElementClass {
  const cls: Slenderness = lambda <= lambdaP ? "compact" : lambda <= lambdaR ? "noncompact" : "slender";
  return { lambda, lambdaP, lambdaR, class: cls };
}

export function flangeClass(bf: number, tf: number, E: number, Fy: number): ElementClass {
  const r = Math.sqrt(E / Fy);
  return classify(bf / (2 * tf), 0.38 * r, 1.0 * r);
}

/** h is the clear web height (rolled shapes: less the fillets; here d − 2tf unless given). */
export function webClass(h: number, tw: number, E: number, Fy: number): ElementClass {
  const r = Math.sqrt(E / Fy);
  return classify(h / tw, 3.76 * r, 5.7 * r);
}
