/** A data table set flush with its panel's padding, rows centred so inline controls line up with text. */
export const PANEL_TABLE_CLASS = 'data-table [&_td]:align-middle [&_td:first-child]:pl-4 [&_th:first-child]:pl-4';
