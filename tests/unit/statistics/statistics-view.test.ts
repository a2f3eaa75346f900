import { describe, expect, it } from 'vitest';
import { toCsv } from '../../../src/components/statistics/csv';
import { apiQuery, readViewState, writeViewState } from '../../../src/components/statistics/view-state';
import { qualityOf, valueRangesOf } from '../../../src/lib/server/statistics/selection-options';

describe('chart data as CSV', () => {
  it.each(['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\tx', '\0x'])('neutralises the text cell %j', (text) => {
    // source: OWASP, "CSV Injection" (cells beginning with = + - @ tab CR LF; ASVS 5.0 adds NUL)
    expect(
      toCsv(['series'], [[text]])
        .split('\r\n')[1]
        ?.startsWith("'"),
    ).toBe(true);
  });

  it('writes numbers as numbers, quotes text with commas, and ends rows with CRLF', () => {
    expect(
      toCsv(
        ['series', 'x'],
        [
          ['a, b', -1.5],
          ['=HYPERLINK("x")', null],
        ],
      ),
    ).toBe('series,x\r\n"a, b",-1.5\r\n"\'=HYPERLINK(""x"")",\r\n');
  });
});

describe('the view in the address', () => {
  it('keeps the selection and the view apart and round-trips', () => {
    const state = readViewState('unit=vennmoor-peat&depth=2..6&tab=correlations&pair=cv-ll&weighting=byClass&colour=unit');
    expect(state.selection.toString()).toBe('unit=vennmoor-peat&depth=2..6');
    expect(state).toMatchObject({ tab: 'correlations', pair: 'cv-ll', weighting: 'byClass', colour: 'unit', waterTableM: 1 });
    expect(readViewState(writeViewState(state))).toEqual(state);
    expect(apiQuery(state, { pair: 'cv-ll' })).toBe('unit=vennmoor-peat&depth=2..6&weighting=byClass&pair=cv-ll');
  });

  it('falls back to the defaults for values it does not know', () => {
    const state = readViewState('tab=nowhere&pair=xx&waterTableM=-4');
    expect(state).toMatchObject({ tab: 'typical', pair: 'cc-ll', colour: 'origin', weighting: 'equal', waterTableM: 1 });
  });
});

describe('selection to the core', () => {
  it('sends ranges of masked parameters to the core and leaves depth to SQL', () => {
    expect(valueRangesOf({ depth: { min: 5 }, cc: { max: 0.8 }, cvNc: { min: 0.5, max: 2 } })).toEqual({
      compressionIndex: { max: 0.8 },
      cvNcM2PerYear: { min: 0.5, max: 2 },
    });
  });

  it('turns the quality facet into the core’s filter, with the weighting', () => {
    expect(qualityOf({ quality: [2, 1, 2] }, 'byClass')).toEqual({ include: [1, 2], weighting: 'byClass' });
    expect(qualityOf({})).toEqual({ weighting: 'equal' });
  });
});
