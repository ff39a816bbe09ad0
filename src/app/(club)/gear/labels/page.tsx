import type { Metadata } from "next";
import QRCode from "qrcode";
import { PrintButton } from "@/components/gear/print-button";
import { Card, PageHeader } from "@/components/ui/notice";
import { gearKindLabels } from "@/lib/gear/kinds";
import { paginateLabels, paperSizes, sheetLayout, SHEET_MARGIN_MM, LABEL_GAP_MM, type PaperSize } from "@/lib/gear/label-sheet";
import { appUrl } from "@/env";
import { listItems } from "@/server/services/gear";
import { requirePageViewer } from "@/server/session";
import { gearListQuerySchema } from "@/validations/gear";

export const metadata: Metadata = { title: "QR labels" };

/**
 * Choose items (a plain GET form, so it works without scripts), then print the sheet: each label
 * has the label code, the name and a QR code of the item page's address, drawn as SVG here.
 */
export default async function LabelsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { actor } = await requirePageViewer("gear.manage");
  const search = await searchParams;
  const chosen = new Set([search.items ?? []].flat().flatMap((value) => value.split(",")).filter(Boolean));
  const paper: PaperSize = search.paper === "letter" ? "letter" : "a4";
  const { rows: items } = await listItems(actor, gearListQuerySchema.parse({ pageSize: 200 }));
  const selected = items.filter((item) => chosen.has(item.id));
  const layout = sheetLayout(paper);
  const origin = appUrl();
  const labels = await Promise.all(
    selected.map(async (item) => {
      const url = `${origin}/gear/${item.id}`;
      const svg = await QRCode.toString(url, { type: "svg", errorCorrectionLevel: "M", margin: 1 });
      return { ...item, url, svg };
    }),
  );
  const pages = paginateLabels(labels, layout);
  const { widthMm, heightMm } = paperSizes[paper];

  return (
    <>
      <style>{`@media print { @page { size: ${paper === "a4" ? "A4" : "letter"}; margin: 0; } main { padding: 0 !important; max-width: none !important; } }`}</style>
      <div className="no-print">
        <PageHeader title="QR labels">{labels.length > 0 && <PrintButton />}</PageHeader>
        <Card title="Choose the items">
          <form method="get" aria-label="Choose labels">
            <fieldset className="mb-4">
              <legend className="font-bold">Paper</legend>
              {(Object.keys(paperSizes) as PaperSize[]).map((size) => (
                <label key={size} className="mr-6 inline-flex min-h-11 items-center gap-2">
                  <input type="radio" name="paper" value={size} defaultChecked={size === paper} className="size-5 accent-copper-700" />
                  {paperSizes[size].label} ({sheetLayout(size).perPage} labels a page)
                </label>
              ))}
            </fieldset>
            <div className="grid max-h-96 gap-1 overflow-y-auto rounded-lg border border-slate-200 p-2 sm:grid-cols-2 lg:grid-cols-3">
              {items.map((item) => (
                <label key={item.id} className="flex min-h-11 items-center gap-2">
                  <input type="checkbox" name="items" value={item.id} defaultChecked={chosen.has(item.id)} className="size-5 accent-copper-700" />
                  <span>
                    <span className="font-bold">{item.labelCode}</span> {item.name} <span className="text-sm text-slate-600">({gearKindLabels[item.kind]})</span>
                  </span>
                </label>
              ))}
            </div>
            <button type="submit" className="mt-4 min-h-11 rounded-lg bg-copper-700 px-4 font-bold text-white hover:bg-copper-800">
              Show the label sheet
            </button>
          </form>
        </Card>
      </div>
      {pages.map((page, pageIndex) => (
        <section
          key={pageIndex}
          aria-label={`Label sheet, page ${pageIndex + 1}`}
          className="mx-auto mb-6 bg-white shadow print:mb-0 print:shadow-none"
          style={{ width: `${widthMm}mm`, height: `${heightMm}mm`, padding: `${SHEET_MARGIN_MM}mm`, breakAfter: "page" }}
        >
          <div style={{ display: "grid", gridTemplateColumns: `repeat(${layout.columns}, ${layout.labelWidthMm}mm)`, gridAutoRows: `${layout.labelHeightMm}mm`, gap: `${LABEL_GAP_MM}mm` }}>
            {page.map((label) => (
              <a
                key={label.id}
                href={label.url}
                data-testid="qr-label"
                className="flex items-center gap-2 overflow-hidden rounded border border-dashed border-slate-300 p-1 text-slate-900 no-underline print:border-slate-200"
              >
                <span className="block shrink-0" style={{ width: `${layout.labelHeightMm - 4}mm`, height: `${layout.labelHeightMm - 4}mm` }} role="img" aria-label={`QR code for ${label.labelCode}`} dangerouslySetInnerHTML={{ __html: label.svg }} />
                <span className="min-w-0">
                  <span className="block text-lg font-bold leading-tight">{label.labelCode}</span>
                  <span className="block text-sm leading-tight">{label.name}</span>
                  <span className="block text-xs leading-tight text-slate-600">Scan to book or return</span>
                </span>
              </a>
            ))}
          </div>
        </section>
      ))}
    </>
  );
}
