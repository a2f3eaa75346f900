import type { IncrementalTestInput } from '../test-input';

/**
 * A planted problem for a steward to find: the dial gauge slips back by `slipMm` during increment
 * `incrementNo` at `fromMin` minutes and is never reset, so that increment's later readings, its end
 * deformation and every later deformation are `slipMm` too small. The interpretation then refuses the
 * increment's cv (readings go backwards) and, when the slip exceeds the increment's own compression, the
 * curve's Cc and σ′p (the specimen appears to swell under a larger load).
 */
export function withDialSlip(
  test: IncrementalTestInput,
  incrementNo: number,
  slipMm: number,
  fromMin: number,
): IncrementalTestInput {
  let slipped = false;
  const increments = [...test.increments]
    .sort((a, b) => a.incrementNo - b.incrementNo)
    .map((inc) => {
      const here = inc.incrementNo === incrementNo;
      const readings = inc.readings?.map((r) =>
        slipped || (here && r.elapsedMin >= fromMin) ? { ...r, deformationMm: r.deformationMm - slipMm } : r,
      );
      if (here) slipped = true;
      const deformationMm = slipped && typeof inc.deformationMm === 'number' ? inc.deformationMm - slipMm : inc.deformationMm;
      return { ...inc, deformationMm, ...(readings ? { readings } : {}) };
    });
  return { ...test, increments };
}
