/**
 * Radial consolidation towards vertical drains (equal-strain theory) and its combination with
 * vertical drainage.
 */

/**
 * Diameter of the soil cylinder drained by one drain, m: de = S·√(4/π) ≈ 1.128·S (square grid)
 * or de = S·√(2√3/π) ≈ 1.050·S (triangular grid), spacing S in m (equal plan area per drain).
 * Source: Barron (1948); UFC 3-220-10 §5-6 quotes 1.13·S and 1.05·S (from memory).
 */
export function influenceDiameterM(spacingM: number, pattern: 'square' | 'triangular'): number {
  return pattern === 'square' ? spacingM * Math.sqrt(4 / Math.PI) : spacingM * Math.sqrt((2 * Math.sqrt(3)) / Math.PI);
}

/**
 * Equivalent diameter of a band (prefabricated) drain of width a and thickness b (any one length
 * unit): dw = 2(a + b)/π (equal perimeter). Source: Hansbo (1979), as used in UFC 3-220-10 §5-6.
 */
export function bandDrainDiameter(width: number, thickness: number): number {
  return (2 * (width + thickness)) / Math.PI;
}

/**
 * Barron's drain-spacing function F(n) = [n²/(n² − 1)]·ln n − (3n² − 1)/(4n²), n = de/dw > 1.
 * Source: Barron (1948) Trans. ASCE 113:718–742, in the form quoted by Hansbo (1981); it gives
 * the reference check values (0.9365 at n = 5). The UFC 3-220-10 Eq. 5-23 text extract brackets
 * it as n²/(n² − 1)·[ln n − (3n² − 1)/(4n²)], smaller by (3n² − 1)/(4n²(n² − 1)), 3 % at n = 5
 * and under 0.1 % for n ≥ 20.
 */
export function barronSpacingFunction(n: number): number {
  const n2 = n * n;
  return (n2 / (n2 - 1)) * Math.log(n) - (3 * n2 - 1) / (4 * n2);
}

/** Approximation F(n) ≈ ln n − 0.75 (error < 1 % for n > 12). Source: UFC 3-220-10 §5-6. */
export function barronSpacingFunctionApprox(n: number): number {
  return Math.log(n) - 0.75;
}

export interface DrainFactorInput {
  /** n = de/dw (> 1). */
  spacingRatio: number;
  /** s = ds/dw (≥ 1); 1 means no smear. */
  smearRatio: number;
  /** kh/ks (≥ 1). */
  khOverKs: number;
  /** Well resistance term (≥ 0), see `wellResistanceMean`. */
  wellResistance: number;
}

/**
 * Hansbo's drain factor μ = ln(n/s) + (kh/ks)·ln s − 0.75 + Fr (n ≫ 1), which equals
 * F(n) ≈ ln n − 0.75 without smear or well resistance. Dimensionless.
 * Source: Hansbo (1981) Proc. 10th ICSMFE Stockholm 3:677–682 (from memory; consistent with UFC
 * 3-220-10 Eqs. 5-23 to 5-26, whose smear term (kh/ks)·ln s omits the −ln s of the exact form).
 */
export function hansboDrainFactor(input: DrainFactorInput): number {
  const { spacingRatio: n, smearRatio: s, khOverKs, wellResistance } = input;
  return Math.log(n / s) + khOverKs * Math.log(s) - 0.75 + wellResistance;
}

/**
 * Depth-averaged well resistance Fr = π·z(2l − z)·kh/qw averaged over 0 ≤ z ≤ l, i.e.
 * (2/3)·π·l²·kh/qw, where l (m) is the drain length drained from one end (the full length when
 * only the top discharges, half when both ends do), kh in m/yr and qw in m³/yr.
 * Source: Hansbo (1981) (from memory); UFC 3-220-10 Eq. 5-26 gives the point value.
 */
export function wellResistanceMean(drainLengthM: number, khMPerYear: number, dischargeM3PerYear: number): number {
  return ((2 / 3) * Math.PI * drainLengthM * drainLengthM * khMPerYear) / dischargeM3PerYear;
}

/**
 * Average degree of radial consolidation Ur = 1 − exp(−8·Th/μ), Th = ch·t/de²; ch m²/yr, t years,
 * de m, μ the drain factor (> 0). Source: Barron (1948) equal strain; UFC 3-220-10 Eq. 5-22.
 */
export function radialDegree(chM2PerYear: number, timeYears: number, influenceDiameter: number, drainFactor: number): number {
  if (!(timeYears > 0)) return 0;
  const th = (chM2PerYear * timeYears) / (influenceDiameter * influenceDiameter);
  return 1 - Math.exp((-8 * th) / drainFactor);
}

/**
 * Combined degree with vertical and radial drainage: U = 1 − (1 − Uv)(1 − Ur) (0…1).
 * Source: Carrillo (1942) J. Math. Phys. 21:1–5; UFC 3-220-10 Eq. 5-27.
 */
export function carrilloCombined(verticalDegree: number, radialDegreeValue: number): number {
  return 1 - (1 - verticalDegree) * (1 - radialDegreeValue);
}
