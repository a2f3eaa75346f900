import { describe, expect, it } from 'vitest';
import { specimenState } from '../../../src/lib/lab/specimen-state';

describe('the specimen before loading', () => {
  it('takes e0 from the dry mass through the height of solids', () => {
    // source: ASTM D2435/D2435M, Hs = Md/(Gs·ρw·A), e0 = H0/Hs − 1. By hand: A = π·6.35²/4 = 31.669 cm²,
    // Hs = 100/(2.70 × 31.669) = 1.16950 cm, e0 = 2.54/1.16950 − 1 = 1.17186
    const state = specimenState({ initialHeightMm: 25.4, diameterMm: 63.5, specificGravity: 2.7, dryMassG: 100 });
    expect(state.ok && state.value.basis).toBe('dry-mass');
    expect(state.ok && state.value.e0).toBeCloseTo(1.17186, 4);
    expect(state.ok && state.value.solidsHeightMm).toBeCloseTo(11.695, 2);
  });

  it('notes a given e0 that disagrees with the dry mass, and uses the dry mass', () => {
    const state = specimenState({
      initialHeightMm: 25.4,
      diameterMm: 63.5,
      specificGravity: 2.7,
      dryMassG: 100,
      initialVoidRatio: 1.4,
    });
    expect(state.ok && state.value.e0).toBeCloseTo(1.17186, 4);
    expect(state.ok && state.value.notes[0]).toMatch(/differs from 1.17/);
  });

  it('uses a given e0, else w·Gs for a saturated specimen', () => {
    // source: phase relations Se = wGs with S = 1 (e.g. UFC 3-220-10 Ch. 2) — from memory
    expect(specimenState({ initialHeightMm: 20, diameterMm: 75, initialVoidRatio: 1.5 })).toMatchObject({
      ok: true,
      value: { e0: 1.5, basis: 'given', solidsHeightMm: 8 },
    });
    const saturated = specimenState({ initialHeightMm: null, diameterMm: null, waterContentPct: 60, specificGravity: 2.7 });
    expect(saturated.ok && saturated.value.e0).toBeCloseTo(1.62, 10);
    expect(saturated.ok && saturated.value.basis).toBe('water-content');
  });

  it('says what is missing when nothing gives e0', () => {
    const state = specimenState({ initialHeightMm: 20, diameterMm: 75 });
    expect(state).toMatchObject({ ok: false, reason: 'missing-input' });
    expect(!state.ok && state.message).toMatch(/^cannot determine e0: give e0/);
  });
});
