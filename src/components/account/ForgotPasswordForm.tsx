import { type SyntheticEvent, useState } from 'react';
import { forgotPasswordSchema } from '../../lib/schemas/account';
import FormMessage from './FormMessage';
import { postJson } from './post-json';
import TextField from './TextField';
import { useSchemaForm } from './use-schema-form';

export default function ForgotPasswordForm() {
  const form = useSchemaForm(forgotPasswordSchema, { email: '' });
  const [sent, setSent] = useState<string | null>(null);

  async function onSubmit(event: SyntheticEvent) {
    const done = await form.submit(event, (input) => postJson<{ message: string }>('/api/session/forgot-password', input));
    if (done) setSent(done.message);
  }

  if (sent) {
    return (
      <div className="panel max-w-md space-y-3 p-5">
        <FormMessage kind="success">{sent}</FormMessage>
        <p className="text-sm text-ink-600">
          No mail after a few minutes? Check the spam folder, or <a href="/forgot-password">ask again</a>.
        </p>
      </div>
    );
  }

  return (
    <form className="panel max-w-md space-y-4 p-5" onSubmit={onSubmit} noValidate data-testid="forgot-password-form">
      {form.formError && <FormMessage kind="error">{form.formError}</FormMessage>}
      <TextField
        id="forgot-email"
        label="E-mail address"
        type="email"
        autoComplete="email"
        value={form.values.email}
        onValueChange={(value) => form.setValue('email', value)}
        error={form.fieldErrors.email}
      />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <button type="submit" className="btn-primary" disabled={form.busy}>
          {form.busy ? 'Sending…' : 'Send a reset link'}
        </button>
        <a href="/sign-in" className="text-sm">
          Back to sign-in
        </a>
      </div>
    </form>
  );
}
