import { templateCsv } from '../../../lib/import';
import { handleApi } from '../../../lib/server/http/respond';

export const prerender = false;

/** The CSV template: every column the bank imports, with one row of invented example data. */
export const GET = handleApi(
  () =>
    new Response(templateCsv(), {
      headers: {
        'content-type': 'text/csv; charset=utf-8',
        'content-disposition': 'attachment; filename="claybank-template.csv"',
        'cache-control': 'no-store',
      },
    }),
);
