/** Combination factors psi_0, psi_1, psi_2 of one kind of variable action (dimensionless). */
export interface CombinationFactors {
  /** psi_0: combination value. */
  readonly psi0: number;
  /** psi_1: frequent value. */
  readonly psi1: number;
  /** psi_2: quasi-permanent value. */
  readonly psi2: number;
}

/** The categories of imposed load of EN 1991-1-1 Table 6.1 and 6.7 that Table A1.1 lists. */
export type ImposedCategory = "A" | "B" | "C" | "D" | "E" | "F" | "G";

/** Where the building stands, for the snow row of Table A1.1. */
export type SnowSite = "up-to-1000m" | "above-1000m" | "nordic";

const psi = (psi0: number, psi1: number, psi2: number): CombinationFactors => Object.freeze({ psi0, psi1, psi2 });

/** The psi factors of Table A1.1, by kind of action. */
export interface PsiTable {
  /** Imposed loads in buildings, by category of use. */
  readonly imposed: Readonly<Record<ImposedCategory, CombinationFactors>>;
  /** Category H, roofs (the roof-live category). */
  readonly roof: CombinationFactors;
  /** Snow, by site. */
  readonly snow: Readonly<Record<SnowSite, CombinationFactors>>;
  /** Wind. */
  readonly wind: CombinationFactors;
}

/** The partial factors of Table A1.2(B) (dimensionless). */
export interface PartialFactors {
  /** gamma_G,sup, on unfavourable permanent actions. */
  readonly permanentUnfavourable: number;
  /** gamma_G,inf, on favourable permanent actions. */
  readonly permanentFavourable: number;
  /** gamma_Q, on unfavourable variable actions. */
  readonly variable: number;
  /** xi, the reduction factor on unfavourable permanent actions in 6.10b. */
  readonly xi: number;
}

/**
 * EN 1990:2002 Annex A1, Table A1.1, recommended psi factors for buildings: imposed loads by
 * category (A domestic, B office, C congregation, D shopping, E storage, F traffic up to 30 kN,
 * G traffic 30 to 160 kN), H roofs, snow, wind. National annexes may set others.
 */
export const EN1990_PSI: PsiTable = Object.freeze({
  imposed: Object.freeze({ A: psi(0.7, 0.5, 0.3), B: psi(0.7, 0.5, 0.3), C: psi(0.7, 0.7, 0.6), D: psi(0.7, 0.7, 0.6), E: psi(1.0, 0.9, 0.8), F: psi(0.7, 0.7, 0.6), G: psi(0.7, 0.5, 0.3) }),
  roof: psi(0, 0, 0),
  snow: Object.freeze({ nordic: psi(0.7, 0.5, 0.2), "above-1000m": psi(0.7, 0.5, 0.2), "up-to-1000m": psi(0.5, 0.2, 0) }),
  wind: psi(0.6, 0.2, 0),
});

/**
 * EN 1990:2002 Annex A1, Table A1.2(B), recommended partial factors for the persistent and
 * transient design situations (set B): gamma_G,sup = 1.35 and gamma_G,inf = 1.00 on permanent
 * actions, gamma_Q = 1.5 on variable actions (0 where favourable), and xi = 0.85, the reduction
 * of the unfavourable permanent actions in expression 6.10b.
 */
export const EN1990_GAMMA: PartialFactors = Object.freeze({ permanentUnfavourable: 1.35, permanentFavourable: 1.0, variable: 1.5, xi: 0.85 });
