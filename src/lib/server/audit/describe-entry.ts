import { FIRM_ROLE_LABELS, isFirmRole } from '../../permissions/roles';

/** What the describer needs of an entry: names already looked up, the summary as stored. */
export interface EntryFacts {
  actor: string | null;
  firmName: string | null;
  action: string;
  outcome: string;
  objectName: string | null;
  objectId: string | null;
  summary: Record<string, unknown>;
}

const text = (value: unknown): string | null => (typeof value === 'string' && value !== '' ? value : null);
const count = (value: unknown, one: string, many = `${one}s`) =>
  typeof value === 'number' ? `${value.toLocaleString('en-GB')} ${value === 1 ? one : many}` : null;
const role = (value: unknown) => (isFirmRole(value) ? FIRM_ROLE_LABELS[value].toLowerCase() : (text(value) ?? 'a new role'));
const quoted = (value: string | null, fallback: string) => (value ? `“${value}”` : fallback);
const nameIn = (value: unknown) => (value && typeof value === 'object' ? text((value as { name?: unknown }).name) : null);

type Describe = (who: string, f: EntryFacts, s: Record<string, unknown>) => string;

const FILE = (f: EntryFacts, s: Record<string, unknown>) => quoted(text(s.file) ?? f.objectName, 'a submission');

/** Sentences per action; the subject comes first. Unknown actions fall back to their dotted name. */
const SENTENCES: Record<string, Describe> = {
  'auth.sign_in': (who, f, s) =>
    f.outcome === 'ok'
      ? `${who} signed in`
      : `A sign-in as ${text(s.email) ?? 'someone'} failed (${text(s.reason) ?? 'refused'})`,
  'auth.sign_out': (who) => `${who} signed out`,
  'auth.password_reset': (who) => `${who} reset their password`,
  'permission.refused': (who, _f, s) =>
    `${who} was refused ${text(s.method) ?? ''} ${text(s.path) ?? 'a request'}`.replace(/\s+/g, ' ').trim(),
  'submission.uploaded': (who, f, s) =>
    `${who} submitted ${FILE(f, s)}, ${count(s.rows, 'record') ?? 'some records'}${s.via === 'api' ? ' (by API key)' : ''}`,
  'submission.resubmitted': (who, f, s) => `${who} sent ${FILE(f, s)} back for review`,
  'submission.withdrawn': (who, f, s) => `${who} withdrew ${FILE(f, s)}`,
  'submission.accepted': (who, f, s) =>
    `${who} accepted ${FILE(f, s)}${typeof s.bankVersion === 'number' ? `, published in bank version ${s.bankVersion}` : ''}`,
  'submission.returned': (who, f, s) => `${who} returned ${FILE(f, s)} with comments`,
  'submission.rejected': (who, f, s) => `${who} rejected ${FILE(f, s)}`,
  'record.corrected': (who, _f, s) =>
    `${who} corrected a test record${Array.isArray(s.fields) && s.fields.length ? ` (${s.fields.join(', ')})` : ''}`,
  'bank.version_published': (who, f, s) => `${who} published bank version ${f.objectId ?? ''} with ${count(s.records, 'record')}`,
  'estimate.saved': (who, _f, s) => `${who} saved the estimate ${quoted(text(s.name), '')}`.trim(),
  'firm.created': (who, f, s) => `${who} started the firm ${quoted(text(s.name) ?? f.firmName, '')}`,
  'firm.member_role_changed': (who, f, s) => `${who} made ${f.objectName ?? 'a member'} ${role(s.after)} (was ${role(s.before)})`,
  'firm.member_removed': (who, f) => `${who} removed ${f.objectName ?? 'a member'} from the firm`,
  'firm.member_left': (who, f) => `${who} left ${f.firmName ?? 'the firm'}`,
  'firm.invitation_sent': (who, _f, s) => `${who} invited ${text(s.email) ?? 'someone'} as ${role(s.role)}`,
  'firm.invitation_cancelled': (who) => `${who} cancelled an invitation`,
  'firm.invitation_accepted': (who, f, s) => `${who} joined ${f.firmName ?? 'the firm'} as ${role(s.role)}`,
  'firm.invitation_rejected': (who, f) => `${who} declined an invitation to ${f.firmName ?? 'a firm'}`,
  'firm.api_key_created': (who, f, s) => `${who} created the API key ${quoted(text(s.name) ?? f.objectName, '')}`.trim(),
  'firm.api_key_revoked': (who, f, s) => `${who} revoked the API key ${quoted(text(s.name) ?? f.objectName, '')}`.trim(),
  'firm.ownership_passed': (who, f, s) =>
    `${who} passed the ownership of ${text(s.firmName) ?? f.firmName ?? 'a firm'} to ${nameIn(s.newOwner) ?? 'a member'}`,
  'person.suspended': (who, f, s) => `${who} suspended ${text(s.name) ?? f.objectName ?? 'a person'}: ${text(s.reason) ?? ''}`,
  'person.reinstated': (who, f, s) => `${who} lifted the suspension of ${text(s.name) ?? f.objectName ?? 'a person'}`,
  'settings.disclosure_rule_changed': (who, _f, s) => {
    const after = s.after as { minTests?: number; minFirms?: number; maxFirmSharePct?: number } | undefined;
    return `${who} set the disclosure rule to at least ${after?.minTests} tests from ${after?.minFirms} firms, no firm above ${after?.maxFirmSharePct} %`;
  },
  'vocabulary.unit_merged': (who, _f, s) =>
    `${who} merged the geological unit ${quoted(text(s.from), '')} into ${quoted(text(s.into), '')}, moving ${count(s.movedRecords, 'record')}`,
};

function vocabularySentence(who: string, f: EntryFacts, s: Record<string, unknown>): string | null {
  const match = /^vocabulary\.(region|unit)_(created|updated|renamed|retired|reinstated)$/.exec(f.action);
  if (!match) return null;
  const kind = match[1] === 'unit' ? 'geological unit' : 'region';
  const before = nameIn(s.before);
  const name = nameIn(s.after) ?? text(s.name) ?? f.objectName ?? '';
  const verbs: Record<string, string> = {
    created: `added the ${kind} ${quoted(name, '')}`,
    updated: `edited the ${kind} ${quoted(name, '')}`,
    renamed: `renamed the ${kind} ${quoted(before, '')} to ${quoted(name, '')} (the old name still matches uploads)`,
    retired: `retired the ${kind} ${quoted(name, '')}`,
    reinstated: `put the ${kind} ${quoted(name, '')} back in use`,
  };
  return `${who} ${verbs[match[2] as string]}`;
}

/** One plain-language sentence for an audit entry, with names rather than ids. */
export function describeEntry(f: EntryFacts): string {
  const who = f.actor ?? (f.summary.via === 'api' ? 'A partner script' : 'Someone');
  const sentence = SENTENCES[f.action]?.(who, f, f.summary) ?? vocabularySentence(who, f, f.summary);
  const base = sentence ?? `${who}: ${f.action.replace(/[._]/g, ' ')}`;
  const firm = f.firmName && !base.includes(f.firmName) ? ` (${f.firmName})` : '';
  return `${base.replace(/\s+/g, ' ').trim()}${firm}.`.replace(/[.:]\.$/, '.');
}
