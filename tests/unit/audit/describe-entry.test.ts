import { describe, expect, it } from 'vitest';
import { describeEntry, type EntryFacts } from '../../../src/lib/server/audit/describe-entry';

const facts = (action: string, summary: Record<string, unknown>, more: Partial<EntryFacts> = {}): EntryFacts => ({
  actor: 'Ana Brook',
  firmName: 'Quillfen Ground Partners',
  action,
  outcome: 'ok',
  objectName: null,
  objectId: null,
  summary,
  ...more,
});

describe('the activity log in plain words', () => {
  it.each([
    [
      facts('submission.uploaded', { file: 'estuary-2026.csv', rows: 16, via: 'browser' }),
      'Ana Brook submitted “estuary-2026.csv”, 16 records (Quillfen Ground Partners).',
    ],
    [
      facts('submission.uploaded', { file: 'api-upload.csv', rows: 1, via: 'api' }, { actor: null }),
      'A partner script submitted “api-upload.csv”, 1 record (by API key) (Quillfen Ground Partners).',
    ],
    [
      facts('firm.member_role_changed', { before: 'contributor', after: 'engineer' }, { objectName: 'Ravi Holt' }),
      'Ana Brook made Ravi Holt engineer (was contributor) (Quillfen Ground Partners).',
    ],
    [
      facts(
        'firm.ownership_passed',
        { firmName: 'Quillfen Ground Partners', newOwner: { userId: 'u2', name: 'Ravi Holt' } },
        { actor: 'Rowan Pike' },
      ),
      'Rowan Pike passed the ownership of Quillfen Ground Partners to Ravi Holt.',
    ],
    [
      facts(
        'vocabulary.unit_renamed',
        { before: { name: 'Saltreach Marine Clay' }, after: { name: 'Saltreach Estuarine Clay' } },
        { firmName: null },
      ),
      'Ana Brook renamed the geological unit “Saltreach Marine Clay” to “Saltreach Estuarine Clay” (the old name still matches uploads).',
    ],
    [
      facts('vocabulary.unit_merged', { from: 'Fen Peat', into: 'Vennmoor Peat', movedRecords: 12 }, { firmName: null }),
      'Ana Brook merged the geological unit “Fen Peat” into “Vennmoor Peat”, moving 12 records.',
    ],
    [
      facts('permission.refused', { method: 'GET', path: '/api/estimates' }, { outcome: 'refused', firmName: null }),
      'Ana Brook was refused GET /api/estimates.',
    ],
  ])('%#: %s', (entry, sentence) => {
    expect(describeEntry(entry)).toBe(sentence);
  });

  it('falls back to the action in words for an action it does not know, never to an id', () => {
    expect(
      describeEntry(facts('survey.imported', {}, { firmName: null, objectId: 'f81d4fae-7dec-11d0-a765-00a0c91e6bf6' })),
    ).toBe('Ana Brook: survey imported.');
  });
});
