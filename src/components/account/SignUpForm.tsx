import type { SyntheticEvent } from 'react';
import { PASSWORD_MIN_LENGTH, signUpSchema } from '../../lib/schemas/account';
import FormMessage from './FormMessage';
import { postJson } from './post-json';
import TextField from './TextField';
import { useSchemaForm } from './use-schema-form';

export default function SignUpForm() {
  const form = useSchemaForm(signUpSchema, { name: '', email: '', password: '' });

  async function onSubmit(event: SyntheticEvent) {
    const done = await form.submit(event, (input) => postJson('/api/session/sign-up', input));
    if (done) window.location.assign('/check-email');
  }

  return (
    <form className="panel max-w-md space-y-4 p-5" onSubmit={onSubmit} noValidate data-testid="sign-up-form">
      {form.formError && <FormMessage kind="error">{form.formError}</FormMessage>}
      <TextField
        id="sign-up-name"
        label="Your name"
        autoComplete="name"
        value={form.values.name}
        onValueChange={(value) => form.setValue('name', value)}
        error={form.fieldErrors.name}
        hint="Shown to the members of your firms."
      />
      <TextField
        id="sign-up-email"
        label="Work e-mail address"
        type="email"
        autoComplete="email"
        value={form.values.email}
        onValueChange={(value) => form.setValue('email', value)}
        error={form.fieldErrors.email}
        hint="Use the address a colleague invited, if you were invited."
      />
      <TextField
        id="sign-up-password"
        label="Password"
        type="password"
        autoComplete="new-password"
        value={form.values.password}
        onValueChange={(value) => form.setValue('password', value)}
        error={form.fieldErrors.password}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
      />
      <button type="submit" className="btn-primary" disabled={form.busy}>
        {form.busy ? 'Creating the account…' : 'Create account'}
      </button>
      <p className="border-t border-ink-100 pt-3 text-sm text-ink-600">
        Already have an account? <a href="/sign-in">Sign in</a>
      </p>
    </form>
  );
}
