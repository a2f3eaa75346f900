/**
 * Exact conversion factors between the bank's SI units and US customary units.
 * source: NIST Special Publication 811 (2008 edition), Guide for the Use of the International System of
 * Units, Appendix B.8 (factors for units listed alphabetically): 1 ft = 0.3048 m and 1 in = 0.0254 m
 * exactly; 1 lbf = 4.448 221 615 260 5 N exactly (from the pound-mass and standard gravity).
 * cv and ch are per Julian year of 365.25 days (common practice for cv in m²/yr).
 */
export const METRES_PER_FOOT = 0.3048;
export const METRES_PER_INCH = 0.0254;
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
export const DAYS_PER_YEAR = 365.25;
export const SECONDS_PER_DAY = 86_400;

const SQUARE_FOOT_M2 = METRES_PER_FOOT * METRES_PER_FOOT;

/** 1 psf (lbf/ft²) in kPa ≈ 0.047 880 26 */
export const KPA_PER_PSF = NEWTONS_PER_POUND_FORCE / SQUARE_FOOT_M2 / 1000;
/** 1 pcf (lbf/ft³) in kN/m³ ≈ 0.157 087 5 */
export const KN_PER_M3_PER_PCF = NEWTONS_PER_POUND_FORCE / METRES_PER_FOOT ** 3 / 1000;
/** 1 ft²/day in m²/yr ≈ 33.933 */
export const M2_PER_YEAR_PER_FT2_PER_DAY = SQUARE_FOOT_M2 * DAYS_PER_YEAR;
/** 1 ft²/kip in m²/MN ≈ 20.885 */
export const M2_PER_MN_PER_FT2_PER_KIP = (SQUARE_FOOT_M2 / (1000 * NEWTONS_PER_POUND_FORCE)) * 1e6;
/** 1 ft/day in m/s ≈ 3.5278e-6 */
export const M_PER_S_PER_FT_PER_DAY = METRES_PER_FOOT / SECONDS_PER_DAY;
