import { type ChangeEvent, useState } from 'react';
import { FIRM_ROLE_LABELS, type FirmRole, PLATFORM_ROLE_LABELS, type PlatformRole } from '../../lib/permissions/roles';
import { postJson } from '../account/post-json';

export interface IdentityMenuFirm {
  firmId: string;
  firmName: string;
  role: FirmRole;
}

export interface IdentityMenuProps {
  /** null when signed out */
  person: { name: string; email: string; platformRole: PlatformRole } | null;
  firms: IdentityMenuFirm[];
  activeFirmId: string | null;
}

/** The header's account corner: who is signed in, which firm they act for, and signing out. */
export default function IdentityMenu({ person, firms, activeFirmId }: IdentityMenuProps) {
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  if (!person) {
    return (
      <a href="/sign-in" className="btn border-ink-500 bg-transparent text-white hover:bg-ink-700" data-testid="sign-in-link">
        Sign in
      </a>
    );
  }

  const activeFirm = firms.find((firm) => firm.firmId === activeFirmId) ?? null;
  const showSwitcher = firms.length > 1 || (firms.length === 1 && !activeFirm);

  async function switchFirm(event: ChangeEvent<HTMLSelectElement>) {
    const firmId = event.target.value;
    if (!firmId || firmId === activeFirmId) return;
    setBusy(true);
    setProblem(null);
    const result = await postJson('/api/session/active-firm', { firmId });
    if (result.ok) {
      window.location.reload();
      return;
    }
    setBusy(false);
    setProblem(result.failure.message);
  }

  async function signOut() {
    setBusy(true);
    setProblem(null);
    const result = await postJson('/api/session/sign-out');
    if (result.ok) {
      window.location.assign('/');
      return;
    }
    setBusy(false);
    setProblem(result.failure.message);
  }

  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm" data-testid="identity-menu">
      <span className="flex items-center gap-2">
        <span className="font-medium text-white" data-testid="identity-name" title={person.email}>
          {person.name}
        </span>
        {person.platformRole !== 'user' && (
          <span className="tag bg-clay-500 text-white" data-testid="platform-role">
            {PLATFORM_ROLE_LABELS[person.platformRole]}
          </span>
        )}
      </span>
      {showSwitcher ? (
        <span className="flex items-center gap-2">
          <label htmlFor="active-firm" className="text-2xs uppercase tracking-wide text-ink-300">
            Active firm
          </label>
          <select
            id="active-firm"
            className="max-w-[16rem] truncate rounded border border-ink-500 bg-ink-700 px-1.5 py-0.5 text-sm text-white"
            value={activeFirmId ?? ''}
            onChange={switchFirm}
            disabled={busy}
            data-testid="firm-switcher"
          >
            {!activeFirm && <option value="">Choose a firm…</option>}
            {firms.map((firm) => (
              <option key={firm.firmId} value={firm.firmId}>
                {firm.firmName} ({FIRM_ROLE_LABELS[firm.role]})
              </option>
            ))}
          </select>
        </span>
      ) : null}
      {activeFirm && !showSwitcher && (
        <span className="max-w-[18rem] truncate text-ink-200" data-testid="active-firm" title={activeFirm.firmName}>
          <span className="text-white">{activeFirm.firmName}</span> · {FIRM_ROLE_LABELS[activeFirm.role]}
        </span>
      )}
      {firms.length === 0 && person.platformRole === 'user' && (
        <a href="/firm/new" className="text-ink-200 hover:text-white" data-testid="no-firm">
          No firm yet
        </a>
      )}
      <button
        type="button"
        className="btn border-ink-500 bg-transparent text-white hover:bg-ink-700"
        onClick={signOut}
        disabled={busy}
      >
        Sign out
      </button>
      {problem && (
        <p role="alert" className="w-full text-xs text-fault-100">
          {problem}
        </p>
      )}
    </div>
  );
}
