import { useState } from 'react';
import type { CellEdit } from './CheckStep';

export type EditMap = Record<string, Record<string, string>>;

/** Cell corrections typed in the browser, by row number and field, as the upload options carry them. */
export function useCellEdits(fileText: (row: number, field: string) => string) {
  const [edits, setEdits] = useState<EditMap>({});

  function set(row: number, field: string, text: string) {
    setEdits((current) => {
      const { [field]: _old, ...rowRest } = current[String(row)] ?? {};
      const rowEdits = text === fileText(row, field) ? rowRest : { ...rowRest, [field]: text };
      const { [String(row)]: _row, ...rest } = current;
      return Object.keys(rowEdits).length ? { ...rest, [String(row)]: rowEdits } : rest;
    });
  }

  const list: CellEdit[] = Object.entries(edits)
    .flatMap(([row, fields]) => Object.entries(fields).map(([field, text]) => ({ row: Number(row), field, text })))
    .sort((a, b) => a.row - b.row);

  return {
    edits,
    list,
    set,
    undo: (row: number, field: string) => set(row, field, fileText(row, field)),
    clear: () => setEdits({}),
    textOf: (row: number, field: string) => edits[String(row)]?.[field] ?? fileText(row, field),
  };
}
