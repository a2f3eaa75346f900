/** How the oedometer test loaded the specimen, as the bank stores it (the bank tables use this list too). */
export const TEST_METHODS = ['incremental', 'crs'] as const;
export type TestMethod = (typeof TEST_METHODS)[number];

const SPELLINGS: ReadonlyMap<string, TestMethod> = new Map([
  ['incremental', 'incremental'],
  ['il', 'incremental'],
  ['incrementalloading', 'incremental'],
  ['incrementalload', 'incremental'],
  ['incrementalloadingoedometer', 'incremental'],
  ['astmd2435', 'incremental'],
  ['iso178925', 'incremental'],
  ['crs', 'crs'],
  ['constantrateofstrain', 'crs'],
  ['constantrateofstraincrs', 'crs'],
  ['controlledstrain', 'crs'],
  ['controlledstrainloading', 'crs'],
  ['astmd4186', 'crs'],
]);

/** "IL", "incremental loading" → incremental; "CRS", "constant rate of strain" → crs; otherwise null. */
export function canonicalTestMethod(text: string): TestMethod | null {
  return SPELLINGS.get(text.toLowerCase().replace(/[^a-z0-9]/g, '')) ?? null;
}
