import { z } from 'zod';
import { UNIT_SYSTEMS } from '../preferences/unit-system';

/** Saving an estimate for the active firm. The firm, author and ids come from the session, never the body. */
export const saveEstimateSchema = z.strictObject({
  name: z.string({ error: 'Name the estimate.' }).trim().min(1, 'Name the estimate.').max(120, 'Use at most 120 characters.'),
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose SI or US.' }),
  input: z.record(z.string(), z.unknown(), { error: 'input must be the estimate profile as a JSON object.' }),
  resultSummary: z.record(z.string(), z.unknown()).nullable().optional(),
});

export type SaveEstimateInput = z.infer<typeof saveEstimateSchema>;
