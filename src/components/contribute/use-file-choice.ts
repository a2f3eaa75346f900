import { useCallback, useEffect, useRef, useState } from 'react';
import type { FieldMappingAnswer } from '../../lib/contracts/submissions';
import type { Vocabulary } from '../../lib/contracts/vocabulary';
import { autoMapColumns, type Delimiter, type RememberedMapping } from '../../lib/import';
import { getJson } from '../account/post-json';
import { type ColumnChoice, choicesFromAuto, chooseField, chooseUnit } from './column-choices';
import { type FileRead, formatFromName, readChosenFile, type UploadFormat } from './read-file';

/** The geological unit a geology code names, when the code is the unit's own name. */
function geologyDefaults(codes: readonly string[], vocabulary: Vocabulary | null): Record<string, string> {
  const map: Record<string, string> = {};
  for (const code of codes) {
    const unit = vocabulary?.units.find((u) => u.name.toLowerCase() === code.toLowerCase() || u.slug === code.toLowerCase());
    if (unit) map[code] = unit.name;
  }
  return map;
}

/**
 * The chosen file as read in the browser, and the choices about reading it: its kind, delimiter, column
 * fields and units (matched automatically, from the firm's remembered choices first), and AGS4 geology codes.
 */
export function useFileChoice(onReset: () => void) {
  const [file, setFile] = useState<File | null>(null);
  const [format, setFormat] = useState<UploadFormat>('csv');
  const [chosenDelimiter, setChosenDelimiter] = useState<Delimiter | undefined>();
  const [read, setRead] = useState<FileRead>({ kind: 'none' });
  const [choices, setChoices] = useState<ColumnChoice[]>([]);
  const [geologyMap, setGeologyMap] = useState<Record<string, string>>({});
  const [remembered, setRemembered] = useState<RememberedMapping>({});
  const [vocabulary, setVocabulary] = useState<Vocabulary | null>(null);
  const readToken = useRef(0);

  useEffect(() => {
    void getJson<FieldMappingAnswer>('/api/firm/field-mapping').then((r) => r.ok && setRemembered(r.data.mapping));
    void getJson<Vocabulary>('/api/vocabulary').then((r) => r.ok && setVocabulary(r.data));
  }, []);

  const start = useCallback(
    async (next: File, nextFormat: UploadFormat, delimiter: Delimiter | undefined) => {
      const token = ++readToken.current;
      onReset();
      setRead({ kind: 'reading', fraction: 0, rowsRead: 0 });
      const result = await readChosenFile(next, nextFormat, delimiter, (fraction, rowsRead) => {
        if (token === readToken.current) setRead({ kind: 'reading', fraction, rowsRead });
      });
      if (token !== readToken.current) return;
      setRead(result);
      if (result.kind === 'csv') setChoices(choicesFromAuto(autoMapColumns(result.table.headers, remembered)));
      if (result.kind === 'ags4') setGeologyMap(geologyDefaults(result.geologyCodes, vocabulary));
    },
    [onReset, remembered, vocabulary],
  );

  return {
    file,
    format,
    chosenDelimiter,
    read,
    choices,
    geologyMap,
    vocabulary,
    chooseFile(next: File) {
      const nextFormat = formatFromName(next.name);
      setFile(next);
      setFormat(nextFormat);
      setChosenDelimiter(undefined);
      void start(next, nextFormat, undefined);
    },
    chooseFormat(nextFormat: UploadFormat) {
      setFormat(nextFormat);
      if (file) void start(file, nextFormat, chosenDelimiter);
    },
    chooseDelimiter(delimiter: Delimiter) {
      setChosenDelimiter(delimiter);
      if (file) void start(file, format, delimiter);
    },
    chooseField(column: number, field: string | null) {
      setChoices((current) => chooseField(current, column, field));
    },
    chooseUnit(column: number, unit: string) {
      setChoices((current) => chooseUnit(current, column, unit));
    },
    chooseGeology(code: string, unitName: string) {
      setGeologyMap((current) => {
        const { [code]: _old, ...rest } = current;
        return unitName ? { ...rest, [code]: unitName } : rest;
      });
    },
  };
}
