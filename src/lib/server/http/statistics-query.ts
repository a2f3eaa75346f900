import type { z } from 'zod';
import type { BankSelection } from '../../schemas/bank-selection';
import { parseStatisticsQuery } from '../../schemas/statistics-request';
import { ApiError } from './api-error';

/** The bank selection and a view's options from the query string; ApiError (400) naming each bad parameter. */
export function readStatisticsQuery<S extends z.ZodType>(
  url: URL,
  options: S,
): { selection: BankSelection; options: z.output<S> } {
  const parsed = parseStatisticsQuery(url.searchParams, options);
  if (!parsed.success) {
    throw new ApiError(
      'VALIDATION_FAILED',
      'Some query parameters are invalid; see issues. The selection uses the bank browser’s parameters (unit=…, depth=5..15, cc=..0.8).',
      parsed.issues,
    );
  }
  return { selection: parsed.selection, options: parsed.options };
}
