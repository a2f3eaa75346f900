import { parseUnit, unitKey } from './units';

/**
 * Converting AGS4 values to the bank's units, following each heading's UNIT entry. An empty unit is
 * taken as the AGS4 default for that heading (m, mm, kPa, m2/yr, m2/MN, Mg/m3, %).
 */
export type AgsQuantity = 'depth' | 'specimen' | 'stress' | 'cv' | 'mv' | 'density' | 'percent';

/** Standard acceleration of gravity, m/s². source: NIST SP 811 (2008), Appendix B */
export const STANDARD_GRAVITY = 9.80665;
/** Density of water used for Gs = ρs/ρw, Mg/m³ (common practice). */
export const WATER_DENSITY_MG_PER_M3 = 1.0;

export const HEADING_QUANTITY: Readonly<Record<string, AgsQuantity>> = {
  LOCA_NATE: 'depth',
  LOCA_NATN: 'depth',
  SAMP_TOP: 'depth',
  SAMP_BASE: 'depth',
  SPEC_DPTH: 'depth',
  GEOL_TOP: 'depth',
  GEOL_BASE: 'depth',
  CONG_HIGT: 'specimen',
  CONS_INCF: 'stress',
  CONS_CVRT: 'cv',
  CONS_CVLG: 'cv',
  CONS_INMV: 'mv',
  LDEN_BDEN: 'density',
  CONG_BDEN: 'density',
  LPDN_PDEN: 'density',
  CONG_PDEN: 'density',
  LLPL_LL: 'percent',
  LLPL_PL: 'percent',
  LLPL_PI: 'percent',
  LNMC_MC: 'percent',
  CONG_MCI: 'percent',
};

const LENGTH_TO_M: Readonly<Record<string, number>> = { m: 1, mm: 0.001, cm: 0.01, ft: 0.3048, in: 0.0254 };
const DENSITY_TO_MG_PER_M3: Readonly<Record<string, number>> = { 'mg/m3': 1, 't/m3': 1, 'g/cm3': 1, 'g/ml': 1, 'kg/m3': 0.001 };

/**
 * The factor from a heading's unit to the bank's unit (depths and specimen heights to m, stress kPa,
 * cv m²/yr, mv m²/MN, densities Mg/m³, percentages %), or null when the unit is not understood.
 */
export function agsFactor(quantity: AgsQuantity, unit: string): number | null {
  const key = unitKey(unit);
  switch (quantity) {
    case 'depth':
      return key === '' ? 1 : (LENGTH_TO_M[key] ?? null);
    case 'specimen':
      return key === '' ? 0.001 : (LENGTH_TO_M[key] ?? null);
    case 'density':
      return key === '' ? 1 : (DENSITY_TO_MG_PER_M3[key] ?? null);
    case 'percent':
      return key === '' || key === '%' ? 1 : null;
    default: {
      if (key === '') return 1;
      const parsed = parseUnit(unit);
      return parsed && parsed.kind === quantity ? parsed.unit.toSi : null;
    }
  }
}
