// The QR label sheet on A4 and US Letter.
// Source: ISO 216:2007, Writing paper and certain classes of printed matter — Trimmed sizes —
// A and B series (A4 = 210 mm × 297 mm); ANSI/ASME Y14.1, Decimal Inch Drawing Sheet Size and
// Format (size A, "Letter" = 8.5 in × 11 in = 215.9 mm × 279.4 mm).
import { describe, expect, it } from "vitest";
import { LABEL_GAP_MM, SHEET_MARGIN_MM, paginateLabels, paperSizes, sheetLayout } from "@/lib/gear/label-sheet";

describe("the label sheet", () => {
  it("uses the standard paper sizes", () => {
    expect(paperSizes.a4).toMatchObject({ widthMm: 210, heightMm: 297 });
    expect(paperSizes.letter.widthMm).toBeCloseTo(8.5 * 25.4, 6);
    expect(paperSizes.letter.heightMm).toBeCloseTo(11 * 25.4, 6);
  });

  it("fits every label inside the printable area", () => {
    for (const paper of ["a4", "letter"] as const) {
      const layout = sheetLayout(paper);
      const { widthMm, heightMm } = paperSizes[paper];
      const usedWidth = layout.columns * layout.labelWidthMm + (layout.columns - 1) * LABEL_GAP_MM;
      const usedHeight = layout.rows * layout.labelHeightMm + (layout.rows - 1) * LABEL_GAP_MM;
      expect(usedWidth).toBeCloseTo(widthMm - 2 * SHEET_MARGIN_MM, 6);
      expect(usedHeight).toBeLessThanOrEqual(heightMm - 2 * SHEET_MARGIN_MM);
      // One more row would not fit.
      expect(usedHeight + LABEL_GAP_MM + layout.labelHeightMm).toBeGreaterThan(heightMm - 2 * SHEET_MARGIN_MM);
    }
    expect(sheetLayout("a4")).toMatchObject({ columns: 3, rows: 7, perPage: 21 });
    expect(sheetLayout("letter")).toMatchObject({ columns: 3, rows: 6, perPage: 18 });
  });

  it("splits the chosen items into pages in order", () => {
    const items = Array.from({ length: 45 }, (_, index) => index);
    const pages = paginateLabels(items, sheetLayout("a4"));
    expect(pages.map((page) => page.length)).toEqual([21, 21, 3]);
    expect(pages[2]).toEqual([42, 43, 44]);
  });
});
