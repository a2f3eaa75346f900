import type { SyntheticEvent } from 'react';
import type { CreatedFirm } from '../../lib/contracts/firms';
import { createFirmSchema } from '../../lib/schemas/firm';
import FormMessage from '../account/FormMessage';
import { postJson } from '../account/post-json';
import TextField from '../account/TextField';
import { useSchemaForm } from '../account/use-schema-form';

export default function CreateFirmForm() {
  const form = useSchemaForm(createFirmSchema, { name: '' });

  async function onSubmit(event: SyntheticEvent) {
    const created = await form.submit(event, (input) => postJson<CreatedFirm>('/api/firms', input));
    if (created) window.location.assign('/firm');
  }

  return (
    <form className="panel max-w-md space-y-4 p-5" onSubmit={onSubmit} noValidate data-testid="create-firm-form">
      {form.formError && <FormMessage kind="error">{form.formError}</FormMessage>}
      <TextField
        id="firm-name"
        label="Firm name"
        autoComplete="organization"
        value={form.values.name}
        onValueChange={(value) => form.setValue('name', value)}
        error={form.fieldErrors.name}
        hint="As your colleagues know it. You become its owner and can invite them next."
      />
      <button type="submit" className="btn-primary" disabled={form.busy}>
        {form.busy ? 'Creating…' : 'Create the firm'}
      </button>
    </form>
  );
}
