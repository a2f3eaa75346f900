import { type SyntheticEvent, useState } from 'react';
import { PASSWORD_MIN_LENGTH, resetPasswordSchema } from '../../lib/schemas/account';
import FormMessage from './FormMessage';
import { postJson } from './post-json';
import TextField from './TextField';
import { useSchemaForm } from './use-schema-form';

interface ResetPasswordFormProps {
  token: string;
}

export default function ResetPasswordForm({ token }: ResetPasswordFormProps) {
  const form = useSchemaForm(resetPasswordSchema, { token, password: '' });
  const [done, setDone] = useState<string | null>(null);

  async function onSubmit(event: SyntheticEvent) {
    const answer = await form.submit(event, (input) => postJson<{ message: string }>('/api/session/reset-password', input));
    if (answer) setDone(answer.message);
  }

  if (done) {
    return (
      <div className="panel max-w-md space-y-3 p-5">
        <FormMessage kind="success">{done}</FormMessage>
        <a href="/sign-in" className="btn-primary">
          Sign in
        </a>
      </div>
    );
  }

  return (
    <form className="panel max-w-md space-y-4 p-5" onSubmit={onSubmit} noValidate data-testid="reset-password-form">
      {(form.formError || form.fieldErrors.token) && (
        <FormMessage kind="error">
          {form.formError ?? form.fieldErrors.token} <a href="/forgot-password">Ask for a new reset link.</a>
        </FormMessage>
      )}
      <TextField
        id="reset-password"
        label="New password"
        type="password"
        autoComplete="new-password"
        value={form.values.password}
        onValueChange={(value) => form.setValue('password', value)}
        error={form.fieldErrors.password}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. Saving it signs you out everywhere.`}
      />
      <button type="submit" className="btn-primary" disabled={form.busy}>
        {form.busy ? 'Saving…' : 'Save the new password'}
      </button>
    </form>
  );
}
