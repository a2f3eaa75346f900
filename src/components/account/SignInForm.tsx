import type { SyntheticEvent } from 'react';
import { signInSchema } from '../../lib/schemas/account';
import FormMessage from './FormMessage';
import { postJson } from './post-json';
import TextField from './TextField';
import { useSchemaForm } from './use-schema-form';

interface SignInFormProps {
  /** Same-site path to open once signed in (already checked by the page). */
  next: string;
}

export default function SignInForm({ next }: SignInFormProps) {
  const form = useSchemaForm(signInSchema, { email: '', password: '' });

  async function onSubmit(event: SyntheticEvent) {
    const done = await form.submit(event, (input) => postJson('/api/session/sign-in', input));
    if (done) window.location.assign(next);
  }

  return (
    <form className="panel max-w-md space-y-4 p-5" onSubmit={onSubmit} noValidate data-testid="sign-in-form">
      {form.formError && <FormMessage kind="error">{form.formError}</FormMessage>}
      <TextField
        id="sign-in-email"
        label="E-mail address"
        type="email"
        autoComplete="email"
        value={form.values.email}
        onValueChange={(value) => form.setValue('email', value)}
        error={form.fieldErrors.email}
      />
      <TextField
        id="sign-in-password"
        label="Password"
        type="password"
        autoComplete="current-password"
        value={form.values.password}
        onValueChange={(value) => form.setValue('password', value)}
        error={form.fieldErrors.password}
      />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <button type="submit" className="btn-primary" disabled={form.busy}>
          {form.busy ? 'Signing in…' : 'Sign in'}
        </button>
        <a href="/forgot-password" className="text-sm">
          Forgot your password?
        </a>
      </div>
      <p className="border-t border-ink-100 pt-3 text-sm text-ink-600">
        New to Claybank? <a href="/sign-up">Create an account</a>
      </p>
    </form>
  );
}
