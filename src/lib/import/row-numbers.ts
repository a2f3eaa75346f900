/**
 * Row numbers, everywhere in the importer (parse results, mapped rows, edits, errors):
 *
 * - CSV: the row number a spreadsheet shows when it opens the file. The header is row 1, the first data
 *   row is row 2. Blank rows are skipped but still counted, and a quoted cell that spans several lines
 *   belongs to one row, just as a spreadsheet shows it.
 * - AGS4: the 1-based line of the file holding the CONG record the test came from (as a text editor shows it).
 */
export const HEADER_ROW_NUMBER = 1;
export const FIRST_DATA_ROW_NUMBER = 2;
