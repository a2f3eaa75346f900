import { describe, expect, it } from 'vitest';
import {
  columnsFromRecords,
  depthProfile,
  effectiveStressLine,
  statisticsContext,
  uniformLayer,
} from '../../../src/lib/statistics';
import { simulatedRecords } from './support/simulated-selection';

describe('in-situ vertical effective stress line', () => {
  it('γ 18 kN/m³ above a water table at 2 m, 17 below: σ′v0 at 10 m = 2·18 + 8·17 − 8·9.81 = 93.52 kPa', () => {
    // source: Terzaghi's effective stress principle, σ′ = σ − u with hydrostatic u (UFC 3-220-10 Ch. 5)
    const line = effectiveStressLine(
      { layers: [{ thicknessM: 30, unitWeightAboveKnPerM3: 18, unitWeightBelowKnPerM3: 17 }], waterTableDepthM: 2 },
      10,
      10,
    );
    expect(line.depthM[10]).toBe(10);
    expect(line.effectiveStressKpa[10]).toBeCloseTo(93.52, 10);
    expect(line.effectiveStressKpa[1]).toBeCloseTo(18, 10);
  });

  it('refuses a line without layers or with a negative water table', () => {
    expect(() => effectiveStressLine({ layers: [], waterTableDepthM: 1 }, 10)).toThrow(/at least one layer/);
    expect(() => effectiveStressLine({ layers: uniformLayer(18), waterTableDepthM: -1 }, 10)).toThrow(/water table/);
  });
});

describe('depth profile panels', () => {
  const records = simulatedRecords({ seed: 2, count: 120 });
  const context = statisticsContext(columnsFromRecords(records), { viewerFirmId: 'firm-2' });

  it('has the six standard panels, other firms masked, own points true, and the stress line to the deepest point', () => {
    const profile = depthProfile(context, undefined, { layers: uniformLayer(16), waterTableDepthM: 1 });
    expect(profile.panels.map((p) => p.parameter)).toEqual([
      'waterContentPct',
      'liquidLimitPct',
      'initialVoidRatio',
      'compressionIndex',
      'preconsolidationStressKpa',
      'overconsolidationRatio',
    ]);
    const cc = profile.panels[3];
    if (!cc?.pooled.released) throw new Error('expected release');
    const own = records.filter((r) => r.firmId === 'firm-2');
    expect(cc.own?.value).toEqual(own.map((r) => r.compressionIndex));
    expect(cc.pooled.points.depthM).toEqual(records.filter((r) => r.firmId !== 'firm-2').map((r) => r.depthM));
    const deepest = Math.max(...records.map((r) => r.depthM));
    expect(profile.effectiveStressLine?.depthM.at(-1)).toBeCloseTo(deepest, 10);
  });

  it('without unit weights and a water table there is no stress line', () => {
    expect(depthProfile(context).effectiveStressLine).toBeNull();
  });
});
