/**
 * The coarse location the shared record carries instead of coordinates: a cell of a 5 km grid laid over
 * the firm's projected coordinates (easting and northing in metres), written E{easting ÷ 5000}-N{northing
 * ÷ 5000}, each rounded down and zero-padded to at least two digits ("E82-N57"). Exact coordinates stay
 * private; the same grid over the same projection always gives the same cell.
 */
export const LOCATION_CELL_SIZE_M = 5000;
export const LOCATION_CELL_PATTERN = /^E\d{2,4}-N\d{2,4}$/;

/** The cell holding (easting, northing) in metres, or null when it falls outside E00–E9999 / N00–N9999. */
export function locationCellFromCoordinates(eastingM: number, northingM: number): string | null {
  if (!Number.isFinite(eastingM) || !Number.isFinite(northingM)) return null;
  const e = Math.floor(eastingM / LOCATION_CELL_SIZE_M);
  const n = Math.floor(northingM / LOCATION_CELL_SIZE_M);
  if (e < 0 || n < 0 || e > 9999 || n > 9999) return null;
  return `E${String(e).padStart(2, '0')}-N${String(n).padStart(2, '0')}`;
}

/** A written cell in the bank's form ("e12-n07" → "E12-N07"), or null when it does not have that form. */
export function normaliseLocationCell(text: string): string | null {
  const cell = text.trim().toUpperCase().replace(/\s+/g, '');
  return LOCATION_CELL_PATTERN.test(cell) ? cell : null;
}
