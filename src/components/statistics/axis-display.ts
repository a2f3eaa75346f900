import type { AxisVariable } from '../../lib/statistics/correlation-pairs';
import { PARAMETERS } from '../../lib/statistics/parameters';

import { type DisplaySystem, fromSi, headerWithUnit, type QuantityKind } from '../../lib/units/display';
import { PARAMETER_QUANTITY } from './parameter-display';

/** A chart axis in the person's units: its quantity, its title with the unit, and a converter. */
export function axisOf(variable: AxisVariable, system: DisplaySystem) {
  const kind: QuantityKind = variable === 'depthM' ? 'length' : PARAMETER_QUANTITY[variable];
  const symbol = variable === 'depthM' ? 'Depth' : PARAMETERS[variable].symbol;
  return { kind, symbol, title: headerWithUnit(symbol, kind, system), shown: (v: number) => fromSi(v, kind, system) };
}

/** Three significant figures, as every figure on screen. */
export const sig = (value: number | null | undefined) =>
  value === null || value === undefined || !Number.isFinite(value) ? '—' : Number(value.toPrecision(3)).toString();
