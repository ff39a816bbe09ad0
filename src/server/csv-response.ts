// A CSV download: the file name carries the date, so exports taken on different days do not clash.
export function csvResponse(csv: string, baseName: string): Response {
  const date = new Date().toISOString().slice(0, 10);
  return new Response(`\uFEFF${csv}`, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${baseName}-${date}.csv"`,
      "Cache-Control": "no-store",
    },
  });
}
