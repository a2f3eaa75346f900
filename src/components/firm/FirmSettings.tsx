import { useCallback, useEffect, useState } from 'react';
import type { FirmOverview } from '../../lib/contracts/firms';
import type { Json } from '../../lib/contracts/json';
import type { FirmRole } from '../../lib/permissions/roles';
import FormMessage from '../account/FormMessage';
import { getJson } from '../account/post-json';
import ApiKeysPanel from './ApiKeysPanel';
import InvitePanel from './InvitePanel';
import LeaveFirmPanel from './LeaveFirmPanel';
import MembersPanel from './MembersPanel';

interface FirmSettingsProps {
  currentUserId: string;
  firmName: string;
  myRole: FirmRole;
  canManageMembers: boolean;
  canManageApiKeys: boolean;
}

type OverviewState = { kind: 'loading' } | { kind: 'failed'; message: string } | { kind: 'loaded'; overview: Json<FirmOverview> };

/** The active firm's members, invitations, API keys and the way out, loaded from the API. */
export default function FirmSettings({ currentUserId, firmName, myRole, canManageMembers, canManageApiKeys }: FirmSettingsProps) {
  const [state, setState] = useState<OverviewState>({ kind: 'loading' });

  const load = useCallback(async () => {
    const result = await getJson<Json<FirmOverview>>('/api/firm');
    setState(result.ok ? { kind: 'loaded', overview: result.data } : { kind: 'failed', message: result.failure.message });
  }, []);

  useEffect(() => {
    void load();
  }, [load]);

  return (
    <div className="space-y-5" data-testid="firm-settings">
      {state.kind === 'loading' && <p className="text-sm text-ink-500">Loading the firm…</p>}
      {state.kind === 'failed' && <FormMessage kind="error">{state.message}</FormMessage>}
      {state.kind === 'loaded' && (
        <>
          <MembersPanel
            members={state.overview.members}
            currentUserId={currentUserId}
            canManage={canManageMembers}
            onChanged={load}
          />
          {canManageMembers && <InvitePanel invitations={state.overview.invitations} onChanged={load} />}
        </>
      )}
      {canManageApiKeys ? (
        <ApiKeysPanel />
      ) : (
        <p className="text-sm text-ink-600" data-testid="api-keys-elsewhere">
          API keys for your firm's upload scripts are created by its owner and admins. How scripts use them:{' '}
          <a href="/api-guide">the API page</a>.
        </p>
      )}
      <LeaveFirmPanel firmName={firmName} isOwner={myRole === 'owner'} />
    </div>
  );
}
