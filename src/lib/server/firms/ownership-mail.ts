import type { QueuedMail } from '../mail/outbox';

const SIGNATURE = '\n\n— Claybank\nShared consolidation parameters. Preliminary assessment only.';

/** To the member who now owns the firm. */
export function newOwnerMail(to: { email: string; name: string }, firmName: string, firmUrl: string): QueuedMail {
  return {
    kind: 'firm_ownership_received',
    to: to.email,
    subject: `You now own ${firmName} on Claybank`,
    text: `Hello ${to.name},\n\nThe platform admin has passed the ownership of ${firmName} to you. You can now manage its members, invitations, API keys and activity log, and you are the one who can leave the firm only after passing it on.\n\nFirm settings: ${firmUrl}${SIGNATURE}`,
  };
}

/** To the member who owned the firm until now. */
export function formerOwnerMail(
  to: { email: string; name: string },
  firmName: string,
  newOwnerName: string,
  firmUrl: string,
): QueuedMail {
  return {
    kind: 'firm_ownership_passed',
    to: to.email,
    subject: `${newOwnerName} now owns ${firmName} on Claybank`,
    text: `Hello ${to.name},\n\nThe platform admin has passed the ownership of ${firmName} to ${newOwnerName}. You stay in the firm as a firm admin: you can still manage members and API keys, and you can now leave the firm if you wish.\n\nFirm settings: ${firmUrl}${SIGNATURE}`,
  };
}
