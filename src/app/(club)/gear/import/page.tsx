import type { Metadata } from "next";
import { ImportClient } from "@/components/gear/import-client";
import { Card, PageHeader } from "@/components/ui/notice";
import { csvColumns } from "@/lib/gear/csv";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Import gear" };

export default async function ImportPage() {
  await requirePageViewer("gear.manage");
  return (
    <>
      <PageHeader title="Import gear from a CSV file" />
      <Card>
        <p className="mb-2">
          The file needs a header row with these columns (the shelf&apos;s CSV download has them all): <code className="break-words text-sm">{csvColumns.map(([header]) => header).join(", ")}</code>.
        </p>
        <p className="mb-4 text-slate-700">
          Guyline checks every row first and shows what it found. Nothing is imported unless every row is right; then all rows are imported together.
        </p>
        <ImportClient />
      </Card>
    </>
  );
}
