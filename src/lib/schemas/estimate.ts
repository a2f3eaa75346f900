import { z } from 'zod';
import { UNIT_SYSTEMS } from '../preferences/unit-system';
import { estimatePreviewSchema } from './estimate-preview';

/**
 * Saving an estimate for the active firm. `input` is checked exactly as the preview's body is, so a
 * saved estimate can always be opened and computed again. The firm, author and ids come from the
 * session, never the body.
 */
export const saveEstimateSchema = z
  .strictObject({
    name: z.string({ error: 'Name the estimate.' }).trim().min(1, 'Name the estimate.').max(120, 'Use at most 120 characters.'),
    unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose SI or US.' }),
    input: estimatePreviewSchema,
    resultSummary: z.record(z.string(), z.unknown()).nullable().optional(),
  })
  .refine((body) => body.input.unitSystem === body.unitSystem, {
    path: ['input', 'unitSystem'],
    error: 'The profile must use the same unit system as the estimate (unitSystem).',
  });

export type SaveEstimateInput = z.infer<typeof saveEstimateSchema>;
