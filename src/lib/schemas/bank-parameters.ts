/**
 * The numeric parameters a bank selection can range over, and that statistics, the bank browser and
 * exports name. `key` is the short name used in URLs and the API; `field` is the import field key of the
 * same value (the record's shared field); values are always in the bank's SI units (`unitKind` says which
 * conversion applies on display); `logScale` marks the parameters the trade reads on log axes.
 */
import type { QuantityKind } from '../units/display';

export type ParameterUnitKind = Extract<QuantityKind, 'length' | 'stress' | 'cv' | 'percent' | 'ratio'>;

export interface BankParameter {
  key: string;
  field: string;
  label: string;
  unitKind: ParameterUnitKind;
  logScale: boolean;
}

const parameter = <K extends string>(p: BankParameter & { key: K }) => p;

export const BANK_PARAMETERS = [
  parameter({ key: 'depth', field: 'depthTop', label: 'Depth (top)', unitKind: 'length', logScale: false }),
  parameter({ key: 'wn', field: 'waterContentPct', label: 'wn', unitKind: 'percent', logScale: false }),
  parameter({ key: 'll', field: 'liquidLimitPct', label: 'LL', unitKind: 'percent', logScale: false }),
  parameter({ key: 'pi', field: 'plasticityIndexPct', label: 'PI', unitKind: 'percent', logScale: false }),
  parameter({ key: 'e0', field: 'initialVoidRatio', label: 'e0', unitKind: 'ratio', logScale: false }),
  parameter({ key: 'cc', field: 'compressionIndex', label: 'Cc', unitKind: 'ratio', logScale: false }),
  parameter({ key: 'cr', field: 'recompressionIndex', label: 'Cr', unitKind: 'ratio', logScale: false }),
  parameter({ key: 'sigmaP', field: 'preconsolidationStress', label: "σ'p", unitKind: 'stress', logScale: false }),
  parameter({ key: 'ocr', field: 'overconsolidationRatio', label: 'OCR', unitKind: 'ratio', logScale: false }),
  parameter({ key: 'cvNc', field: 'cvNc', label: 'cv (NC)', unitKind: 'cv', logScale: true }),
  parameter({ key: 'cvOc', field: 'cvOc', label: 'cv (OC)', unitKind: 'cv', logScale: true }),
  parameter({ key: 'cAlpha', field: 'secondaryCompressionIndex', label: 'Cα', unitKind: 'ratio', logScale: false }),
] as const;

export type BankParameterKey = (typeof BANK_PARAMETERS)[number]['key'];

export const BANK_PARAMETER_KEYS = BANK_PARAMETERS.map((p) => p.key) as readonly BankParameterKey[];

export const BANK_PARAMETER_BY_KEY = new Map<BankParameterKey, (typeof BANK_PARAMETERS)[number]>(
  BANK_PARAMETERS.map((p) => [p.key, p]),
);
