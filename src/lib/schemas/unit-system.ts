import { z } from 'zod';
import { UNIT_SYSTEMS } from '../preferences/unit-system';

/** `POST /api/preferences/unit-system`: the person's choice, and (from the header form) the page to go back to. */
export const unitSystemChoiceSchema = z.strictObject({
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose SI or US.' }),
  returnTo: z.string().max(2048, 'returnTo is too long.').optional(),
});

export type UnitSystemChoice = z.infer<typeof unitSystemChoiceSchema>;
