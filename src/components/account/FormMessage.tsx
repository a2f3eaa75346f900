import type { ReactNode } from 'react';

interface FormMessageProps {
  kind: 'error' | 'success';
  children: ReactNode;
  testId?: string;
}

/** A message about the whole form: a refusal (announced at once) or a confirmation. */
export default function FormMessage({ kind, children, testId }: FormMessageProps) {
  return kind === 'error' ? (
    <p
      role="alert"
      data-testid={testId ?? 'form-error'}
      className="rounded border border-fault-100 bg-fault-50 px-3 py-2 text-sm text-fault-700"
    >
      {children}
    </p>
  ) : (
    <p
      role="status"
      data-testid={testId ?? 'form-success'}
      className="rounded border border-sound-100 bg-sound-50 px-3 py-2 text-sm text-sound-700"
    >
      {children}
    </p>
  );
}
