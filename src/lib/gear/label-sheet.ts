// The printable label sheet: how many QR labels fit on a page of A4 or US Letter, and which
// items go on which page. Sizes in millimetres.

export const paperSizes = {
  a4: { label: "A4", widthMm: 210, heightMm: 297 },
  letter: { label: "US Letter", widthMm: 215.9, heightMm: 279.4 },
} as const;
export type PaperSize = keyof typeof paperSizes;

/** The printer's safe margin on every side and the gap between labels. */
export const SHEET_MARGIN_MM = 10;
export const LABEL_GAP_MM = 3;
export const LABEL_COLUMNS = 3;
/** Tall enough for a QR code a phone reads from arm's length beside two lines of text. */
export const LABEL_HEIGHT_MM = 36;

export interface SheetLayout {
  paper: PaperSize;
  columns: number;
  rows: number;
  labelWidthMm: number;
  labelHeightMm: number;
  perPage: number;
}

export function sheetLayout(paper: PaperSize): SheetLayout {
  const { widthMm, heightMm } = paperSizes[paper];
  const usableWidth = widthMm - 2 * SHEET_MARGIN_MM;
  const usableHeight = heightMm - 2 * SHEET_MARGIN_MM;
  const labelWidthMm = (usableWidth - (LABEL_COLUMNS - 1) * LABEL_GAP_MM) / LABEL_COLUMNS;
  const rows = Math.floor((usableHeight + LABEL_GAP_MM) / (LABEL_HEIGHT_MM + LABEL_GAP_MM));
  return { paper, columns: LABEL_COLUMNS, rows, labelWidthMm, labelHeightMm: LABEL_HEIGHT_MM, perPage: LABEL_COLUMNS * rows };
}

/** Splits the chosen items into pages of the sheet, in the order given. */
export function paginateLabels<T>(items: readonly T[], layout: SheetLayout): T[][] {
  const pages: T[][] = [];
  for (let index = 0; index < items.length; index += layout.perPage) pages.push(items.slice(index, index + layout.perPage));
  return pages;
}
