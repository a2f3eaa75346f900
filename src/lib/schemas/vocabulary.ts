import { z } from 'zod';

/** Regions and geological units, as stewards curate them. */
export const GENESIS_VALUES = [
  'marine',
  'estuarine',
  'lacustrine',
  'glaciolacustrine',
  'glacial',
  'alluvial',
  'fluvial',
  'organic',
  'residual',
  'aeolian',
  'colluvial',
  'other',
] as const;
export type Genesis = (typeof GENESIS_VALUES)[number];

const name = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(2, 'Use at least 2 characters.')
  .max(80, 'Use at most 80 characters.');
const description = z.string().trim().max(2000, 'Use at most 2,000 characters.').nullable().optional();

export const createRegionSchema = z.strictObject({ name, description });
export const updateRegionSchema = z.strictObject({ name: name.optional(), description });

export const createUnitSchema = z.strictObject({
  name,
  description,
  genesis: z.enum(GENESIS_VALUES, { error: `Choose one of: ${GENESIS_VALUES.join(', ')}.` }),
  age: z.string().trim().max(60, 'Use at most 60 characters.').nullable().optional(),
  typicalRegionId: z.uuid({ error: 'Choose a region from the list.' }).nullable().optional(),
});
export const updateUnitSchema = createUnitSchema.partial();

export type CreateRegionInput = z.infer<typeof createRegionSchema>;
export type UpdateRegionInput = z.infer<typeof updateRegionSchema>;
export type CreateUnitInput = z.infer<typeof createUnitSchema>;
export type UpdateUnitInput = z.infer<typeof updateUnitSchema>;

/** Merges the unit in the address into another: its records move there and its names become synonyms. */
export const mergeUnitSchema = z.strictObject({
  intoUnitId: z.uuid({ error: 'Choose the geological unit to merge into from the list.' }),
});

/** Retires an entry (`true`: no new uploads) or puts it back in use (`false`). */
export const retireSchema = z.strictObject({
  retired: z.boolean({ error: 'Say true to retire it or false to put it back in use.' }),
});

export type MergeUnitInput = z.infer<typeof mergeUnitSchema>;
export type RetireInput = z.infer<typeof retireSchema>;
