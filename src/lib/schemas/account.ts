import { z } from 'zod';

/** Shared by the sign-in/sign-up forms (in the browser) and the session endpoints (on the server). */
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 128;

const email = z
  .string({ error: 'Enter your e-mail address.' })
  .trim()
  .toLowerCase()
  .min(1, 'Enter your e-mail address.')
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email({ error: 'Enter an e-mail address like name@firm.com.' }));

const newPassword = z
  .string({ error: 'Choose a password.' })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters; a few unrelated words work well.`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`);

export const signUpSchema = z.strictObject({
  name: z.string({ error: 'Enter your name.' }).trim().min(1, 'Enter your name.').max(80, 'Use at most 80 characters.'),
  email,
  password: newPassword,
});

export const signInSchema = z.strictObject({
  email,
  password: z.string({ error: 'Enter your password.' }).min(1, 'Enter your password.').max(PASSWORD_MAX_LENGTH),
});

export const forgotPasswordSchema = z.strictObject({ email });

export const resetPasswordSchema = z.strictObject({
  token: z
    .string({ error: 'The reset link is incomplete; open it again from the e-mail.' })
    .min(1, 'The reset link is incomplete.'),
  password: newPassword,
});

export type SignUpInput = z.infer<typeof signUpSchema>;
export type SignInInput = z.infer<typeof signInSchema>;
