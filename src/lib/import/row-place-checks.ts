import { locationCellFromCoordinates, normaliseLocationCell } from './location-cell';
import type { RowInput } from './row-input';
import { formatValue as f } from './row-ranges';
import type { VocabularyEntry, VocabularyIndex } from './vocabulary-match';

/** The shared location cell: the one written (checked), or the one holding easting/northing. */
export function checkLocationCell(row: RowInput): { value: string | null; derived: boolean } {
  const written = row.text('locationCell');
  if (written !== null) {
    const cell = normaliseLocationCell(written);
    if (!cell)
      row.add('locationCell', `Location cell "${written}" is not in the form E12-N07 (E and N each followed by 2 to 4 digits).`);
    return { value: cell, derived: false };
  }
  const e = row.num('easting');
  const n = row.num('northing');
  if (e === null && n === null) return { value: null, derived: false };
  if (e === null || n === null) {
    row.add(
      e === null ? 'easting' : 'northing',
      `${e === null ? 'Northing' : 'Easting'} is given without ${e === null ? 'easting' : 'northing'}; give both, or neither.`,
    );
    return { value: null, derived: false };
  }
  const cell = locationCellFromCoordinates(e, n);
  if (!cell) {
    row.add(
      'easting',
      `Easting ${f(e)} m and northing ${f(n)} m fall outside the 5 km grid Claybank uses for the shared location (0 to 49,999,999 m each). Give a location cell such as E12-N07 instead.`,
    );
  }
  return { value: cell, derived: cell !== null };
}

/** The vocabulary entry a region or geological unit names, or null with a message suggesting the nearest. */
export function checkVocabulary(
  row: RowInput,
  key: 'region' | 'geologicalUnit',
  plural: string,
  index: VocabularyIndex,
): VocabularyEntry | null {
  const written = row.text(key);
  if (written === null) return null;
  const entry = index.find(written);
  if (entry?.retired) {
    row.add(
      key,
      `"${entry.name}" is retired and takes no new uploads. Choose another of the bank’s ${plural}, or ask a data steward.`,
    );
    return null;
  }
  if (entry) return entry;
  const near = index.closest(written);
  const inUse = index.inUse;
  const names = inUse.slice(0, 6).map((e) => e.name);
  const known =
    inUse.length === 0
      ? ` The bank has no ${plural} yet; a data steward adds them.`
      : ` Known ${plural}: ${names.join(', ')}${inUse.length > names.length ? ', …' : ''}. A data steward can add new ones.`;
  row.add(key, `"${written}" is not one of the bank’s ${plural}.${near ? ` Did you mean "${near.name}"?` : known}`);
  return null;
}
