/**
 * Converts the request's load and vertical drains to SI (part of input-conversion.ts).
 */
import type { EstimateLoadInput, EstimatePreviewInput } from '../schemas/estimate-preview';
import type { EngineDrains, EngineLoad } from './engine-input';
import { EngineInputError } from './errors';
import { scaleSpec } from './spec-scaling';
import type { UnitFactors } from './units';
import { bandDrainDiameter } from './vertical-drains';

/** The load in SI (pressure from q or fill height × unit weight). */
export function convertLoad(load: EstimateLoadInput, f: UnitFactors): EngineLoad {
  const fillPressure = (l: {
    pressure?: number | undefined;
    fillHeight?: number | undefined;
    fillUnitWeight?: number | undefined;
  }) => {
    if (l.pressure !== undefined) return l.pressure * f.stress;
    if (l.fillHeight !== undefined && l.fillUnitWeight !== undefined) {
      return l.fillHeight * f.length * l.fillUnitWeight * f.unitWeight;
    }
    throw new EngineInputError('load.pressure', 'Give the load pressure, or fillHeight and fillUnitWeight.');
  };
  switch (load.type) {
    case 'wideFill':
      return { kind: 'wideFill', pressureKpa: fillPressure(load) };
    case 'embankment':
      return {
        kind: 'embankment',
        pressureKpa: fillPressure(load),
        crestWidthM: load.crestWidth * f.length,
        sideSlopeWidthM: load.sideSlopeWidth * f.length,
        pointOffsetM: (load.pointOffset ?? 0) * f.length,
      };
    case 'rectangle':
      return {
        kind: 'rectangle',
        pressureKpa: load.pressure * f.stress,
        widthM: load.width * f.length,
        lengthM: load.length * f.length,
        pointXM: (load.pointX ?? 0) * f.length,
        pointYM: (load.pointY ?? 0) * f.length,
      };
    case 'strip':
      return {
        kind: 'strip',
        pressureKpa: load.pressure * f.stress,
        widthM: load.width * f.length,
        pointOffsetM: (load.pointOffset ?? 0) * f.length,
      };
    case 'circle':
      return {
        kind: 'circle',
        pressureKpa: load.pressure * f.stress,
        diameterM: load.diameter * f.length,
        pointOffsetM: (load.pointOffset ?? 0) * f.length,
      };
    case 'twoToOne': {
      const width = (load.shape === 'circle' ? load.diameter : load.width) ?? 0;
      return {
        kind: 'twoToOne',
        pressureKpa: load.pressure * f.stress,
        shape: load.shape,
        widthM: width * f.length,
        lengthM: (load.length ?? 0) * f.length,
      };
    }
  }
}

/** The drains in SI; band drains become an equivalent diameter (Hansbo 1979). */
export function convertDrains(input: EstimatePreviewInput, f: UnitFactors): EngineDrains | null {
  const d = input.verticalDrains;
  if (!d) return null;
  const drainDiameterM =
    d.drain.type === 'band' ? bandDrainDiameter(d.drain.width, d.drain.thickness) * f.drainSize : d.drain.diameter * f.drainSize;
  const ch: EngineDrains['ch'] =
    d.ch !== undefined
      ? { kind: 'ch', chM2PerYear: scaleSpec(d.ch, f.cv) }
      : d.chOverCv !== undefined
        ? { kind: 'ratio', chOverCv: scaleSpec(d.chOverCv, 1) }
        : (() => {
            throw new EngineInputError('verticalDrains.ch', 'Give ch or chOverCv for the drains.');
          })();
  return {
    pattern: d.pattern,
    spacingM: d.spacing * f.length,
    drainDiameterM,
    bandDrain: d.drain.type === 'band',
    smearRatio: d.smear?.ratio ?? 1,
    khOverKs: d.smear?.khOverKs ?? 1,
    dischargeM3PerYear: d.dischargeCapacity === undefined ? null : d.dischargeCapacity * f.discharge,
    ch,
  };
}
