import type { Transaction } from 'kysely';
import type { Database } from '../db/schema';
import { findFirm } from '../firms/firm-repository';
import type { QueuedMail } from '../mail/outbox';
import { personRecipient, stewardRecipients } from '../mail/recipient-repository';

const SIGNATURE = '\n\n— Claybank\nPreliminary assessment only; pooled data of varying quality.';

/** One mail per steward for a new (or corrected) submission: a digest, not one mail per record. */
export async function stewardsNewSubmissionMails(
  trx: Transaction<Database>,
  facts: { submissionId: string; firmId: string; rowCount: number; flaggedRows: number; appUrl: string; resubmitted: boolean },
): Promise<QueuedMail[]> {
  const stewards = await stewardRecipients(trx);
  const firm = await findFirm(trx, facts.firmId);
  const what = facts.resubmitted ? 'corrected and sent back' : 'submitted';
  const flagged = facts.flaggedRows
    ? `\n${facts.flaggedRows} of them carry import flags (shared text that may identify a site, or that a spreadsheet may run as a formula).`
    : '';
  return stewards.map((steward) => ({
    to: steward.email,
    kind: facts.resubmitted ? 'submission_resubmitted' : 'submission_received',
    dedupeKey: `${facts.submissionId}:${what}:${Date.now()}:${steward.email}`,
    subject: `${firm?.name ?? 'A firm'} ${what} ${facts.rowCount} test record${facts.rowCount === 1 ? '' : 's'} for review`,
    text: `Hello ${steward.name},\n\n${firm?.name ?? 'A firm'} ${what} a submission of ${facts.rowCount} test record${facts.rowCount === 1 ? '' : 's'}.${flagged}\n\nReview it: ${facts.appUrl}/review/${facts.submissionId}${SIGNATURE}`,
  }));
}

export interface DecisionFacts {
  submissionId: string;
  decision: 'accepted' | 'returned' | 'rejected';
  comment: string | null;
  recordComments: { rowNumber: number | null; comment: string }[];
  rowCount: number;
  bankVersion: number | null;
  appUrl: string;
}

/** One mail to the person who submitted, with every per-record comment in it. */
export async function contributorDecisionMail(
  trx: Transaction<Database>,
  submittedBy: string | null,
  facts: DecisionFacts,
): Promise<QueuedMail[]> {
  if (!submittedBy) return [];
  const person = await personRecipient(trx, submittedBy);
  if (!person) return [];
  const link = `${facts.appUrl}/contribute/submissions/${facts.submissionId}`;
  const comments = facts.recordComments.length
    ? `\n\nComments on records:\n${facts.recordComments.map((c) => `- row ${c.rowNumber ?? '?'}: ${c.comment}`).join('\n')}`
    : '';
  const overall = facts.comment ? `\n\nThe steward wrote: ${facts.comment}` : '';
  const body = {
    accepted: `Your submission of ${facts.rowCount} test records was accepted and is published in bank version ${facts.bankVersion}.`,
    returned: 'Your submission was returned for corrections. Fix the records the steward commented on and send it back.',
    rejected: 'Your submission was rejected and will not enter the bank.',
  }[facts.decision];
  return [
    {
      to: person.email,
      kind: `submission_${facts.decision}`,
      dedupeKey: `${facts.submissionId}:${facts.decision}:${Date.now()}`,
      subject: `Your Claybank submission was ${facts.decision}`,
      text: `Hello ${person.name},\n\n${body}${overall}${comments}\n\nOpen it: ${link}${SIGNATURE}`,
    },
  ];
}
