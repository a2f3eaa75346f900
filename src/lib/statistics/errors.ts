/** Input the statistics core cannot work with (mismatched columns, impossible options). */
export class StatisticsInputError extends Error {
  override readonly name = 'StatisticsInputError';
}
