/**
 * How the bank's tests sit against a published correlation: for the tests inside its stated validity,
 * the mean and median of observed/predicted, the mean residual (observed − predicted) and its sd (the
 * scatter), and the share inside the stated range. Pooled figures use masked values under the
 * disclosure rule; the residual sd is corrected for the masking noise (its variance through the
 * equation's local slopes, by central differences), the ratios are not (the masking moves their means
 * by about Var(F), 1–2 %).
 */
import type { StatisticsContext, Withheld } from './context';
import { checkDisclosure } from './disclosure';
import { maskedValues, noiseMoments } from './masking';
import { percentilesBySelection } from './order-statistics';
import { PARAMETERS, type ParameterKey } from './parameters';
import type { PublishedCorrelation } from './published-correlations';
import { SOIL_GROUP_CODE } from './soil-groups';

export interface BiasFigures {
  n: number;
  firms: number;
  meanRatio: number;
  medianRatio: number;
  meanResidual: number;
  /** Null below 2 tests. */
  residualSd: number | null;
  /** Share of tests within the stated range (null when none is stated). */
  withinStatedRange: number | null;
}

/** The correlation without its function, as an API can send it. */
export type PublishedCorrelationInfo = Omit<PublishedCorrelation, 'evaluate'>;

export interface PublishedComparison {
  correlation: PublishedCorrelationInfo;
  pooled: ({ released: true } & BiasFigures) | Withheld;
  own: BiasFigures | null;
}

export function correlationInfo(correlation: PublishedCorrelation): PublishedCorrelationInfo {
  const { evaluate: _evaluate, ...info } = correlation;
  return info;
}

function relativeNoise(key: ParameterKey): number {
  const { factorVariance } = noiseMoments(key);
  return PARAMETERS[key].scale === 'log' ? 0 : factorVariance / (1 + factorVariance);
}

function figures(
  correlation: PublishedCorrelation,
  rows: Int32Array,
  count: number,
  output: Float64Array,
  inputs: Float64Array[],
  firms: number,
  masked: boolean,
): BiasFigures {
  const ratios = new Float64Array(count);
  const residuals = new Float64Array(count);
  const args = new Array<number>(inputs.length);
  let noise = 0;
  let within = 0;
  for (let j = 0; j < count; j++) {
    const i = rows[j] as number;
    for (let k = 0; k < inputs.length; k++) args[k] = (inputs[k] as Float64Array)[i] as number;
    const predicted = correlation.evaluate(args);
    const observed = output[i] as number;
    ratios[j] = observed / predicted;
    residuals[j] = observed - predicted;
    const range = correlation.statedRange;
    if (range && observed >= range.low * predicted && observed <= range.high * predicted) within++;
    if (masked) {
      noise += relativeNoise(correlation.output) * observed * observed;
      for (let k = 0; k < inputs.length; k++) {
        const x = args[k] as number;
        const h = Math.abs(x) * 1e-6 || 1e-9;
        args[k] = x + h;
        const up = correlation.evaluate(args);
        args[k] = x - h;
        const down = correlation.evaluate(args);
        args[k] = x;
        const slope = (up - down) / (2 * h);
        noise += slope * slope * relativeNoise(correlation.inputs[k] as ParameterKey) * x * x;
      }
    }
  }
  let meanResidual = 0;
  let meanRatio = 0;
  for (let j = 0; j < count; j++) {
    meanResidual += residuals[j] as number;
    meanRatio += ratios[j] as number;
  }
  meanResidual /= count;
  meanRatio /= count;
  let squares = 0;
  for (let j = 0; j < count; j++) squares += ((residuals[j] as number) - meanResidual) ** 2;
  const variance = squares / (count - 1) - noise / count;
  const [medianRatio] = percentilesBySelection(ratios, [0.5]) as [number];
  return {
    n: count,
    firms,
    meanRatio,
    medianRatio,
    meanResidual,
    residualSd: count < 2 ? null : Math.sqrt(Math.max(0, variance)),
    withinStatedRange: correlation.statedRange ? within / count : null,
  };
}

/** The bank's bias and scatter against one published correlation, pooled (if the rule allows) and own. */
export function compareWithPublished(context: StatisticsContext, correlation: PublishedCorrelation): PublishedComparison {
  const { columns, classWeights, viewerIndex, rule } = context;
  const info = correlationInfo(correlation);
  const rawOutput = columns.values[correlation.output];
  const rawInputs = correlation.inputs.map((key) => columns.values[key]);
  if (!rawOutput || rawInputs.some((c) => !c)) {
    return {
      correlation: info,
      pooled: { released: false, tests: 0, firms: 0, reasons: checkDisclosure([], rule).reasons },
      own: null,
    };
  }
  const groups = correlation.validity.soilGroups?.map((g) => SOIL_GROUP_CODE[g]) ?? null;
  const ranges = correlation.inputs.map((key) => correlation.validity.ranges[key] ?? null);
  const args = new Array<number>(correlation.inputs.length);
  /** Inside the stated validity, with a positive prediction (a ratio needs one). */
  const inside = (output: Float64Array, inputs: Float64Array[], i: number) => {
    if (!Number.isFinite(output[i] as number)) return false;
    for (let k = 0; k < inputs.length; k++) {
      const x = (inputs[k] as Float64Array)[i] as number;
      const range = ranges[k];
      if (!Number.isFinite(x) || (range && (x < range[0] || x > range[1]))) return false;
      args[k] = x;
    }
    return correlation.evaluate(args) > 0;
  };
  const eligible = (i: number) =>
    (classWeights[columns.qualityClass[i] as number] as number) > 0 &&
    (!groups || groups.includes(columns.soilGroup[i] as number));
  const maskedOutput = maskedValues(columns, correlation.output) as Float64Array;
  const maskedInputs = correlation.inputs.map((key) => maskedValues(columns, key) as Float64Array);
  const inputs = rawInputs as Float64Array[];
  const pooledRows = new Int32Array(columns.length);
  const ownRows = new Int32Array(columns.length);
  const perFirm = new Uint32Array(columns.firmIds.length);
  let pooledCount = 0;
  let ownCount = 0;
  for (let i = 0; i < columns.length; i++) {
    if (!eligible(i)) continue;
    if (inside(maskedOutput, maskedInputs, i)) {
      pooledRows[pooledCount++] = i;
      const firm = columns.firmIndex[i] as number;
      perFirm[firm] = (perFirm[firm] as number) + 1;
    }
    if (columns.firmIndex[i] === viewerIndex && inside(rawOutput, inputs, i)) ownRows[ownCount++] = i;
  }
  const verdict = checkDisclosure(perFirm, rule);
  const own = ownCount > 0 ? figures(correlation, ownRows, ownCount, rawOutput, inputs, 1, false) : null;
  if (!verdict.released) {
    return {
      correlation: info,
      pooled: { released: false, tests: verdict.tests, firms: verdict.firms, reasons: verdict.reasons },
      own,
    };
  }
  const pooled = figures(correlation, pooledRows, pooledCount, maskedOutput, maskedInputs, verdict.firms, true);
  return { correlation: info, pooled: { released: true, ...pooled }, own };
}
