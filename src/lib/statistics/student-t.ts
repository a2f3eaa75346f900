/**
 * Student t quantiles for the confidence and prediction bands, from jstat (its inverse of the
 * regularised incomplete beta function; about 1e-7 relative, checked in the tests against an
 * independent library).
 */
import jStat from 'jstat';
import { StatisticsInputError } from './errors';

/** The t value with probability p below it, for `degreesOfFreedom` > 0 and 0 < p < 1. */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  if (!(p > 0 && p < 1)) throw new StatisticsInputError('A t quantile needs a probability strictly between 0 and 1.');
  if (!(degreesOfFreedom > 0)) throw new StatisticsInputError('A t quantile needs degrees of freedom above 0.');
  return jStat.studentt.inv(p, degreesOfFreedom);
}

/** The two-sided critical value t(1 − α/2, df) for a band of confidence `level` (e.g. 0.9). */
export function twoSidedT(level: number, degreesOfFreedom: number): number {
  if (!(level > 0 && level < 1)) throw new StatisticsInputError('A band level must be strictly between 0 and 1, e.g. 0.9.');
  return studentTQuantile(1 - (1 - level) / 2, degreesOfFreedom);
}
