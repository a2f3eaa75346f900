import { z } from 'zod';
import { ASSIGNABLE_FIRM_ROLES } from '../permissions/roles';

const assignableRole = z.enum(ASSIGNABLE_FIRM_ROLES, { error: 'Choose admin, engineer, estimator or contributor.' });

export const createFirmSchema = z.strictObject({
  name: z
    .string({ error: 'Enter the firm name.' })
    .trim()
    .min(2, 'Use at least 2 characters.')
    .max(80, 'Use at most 80 characters.'),
});

export const inviteMemberSchema = z.strictObject({
  email: z
    .string()
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: 'Enter an e-mail address like name@firm.com.' })),
  role: assignableRole,
});

export const changeMemberRoleSchema = z.strictObject({ role: assignableRole });

export const switchFirmSchema = z.strictObject({ firmId: z.string().min(1, 'Choose a firm.') });

export const createApiKeySchema = z.strictObject({
  name: z
    .string({ error: 'Name the key after the script that will use it.' })
    .trim()
    .min(1, 'Name the key.')
    .max(60, 'Use at most 60 characters.'),
});
