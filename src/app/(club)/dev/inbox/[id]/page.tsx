import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Card, PageHeader } from "@/components/ui/notice";
import { formatInZone } from "@/lib/time";
import { PublicError } from "@/server/errors";
import { getClubSettings } from "@/server/services/accounts";
import { getCapturedMail } from "@/server/services/dev-inbox";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Captured message" };
export const dynamic = "force-dynamic";

export default async function CapturedMessagePage({ params }: { params: Promise<{ id: string }> }) {
  const { actor } = await requirePageViewer("devInbox.view");
  const { id } = await params;
  const message = await getCapturedMail(actor, id).catch((error: unknown) => {
    if (error instanceof PublicError && error.status === 404) notFound();
    throw error;
  });
  const club = await getClubSettings();
  return (
    <>
      <PageHeader title={message.subject}>
        <Link href="/dev/inbox">Back to the inbox</Link>
      </PageHeader>
      <Card>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="font-bold text-slate-600">To</dt>
          <dd>{message.envelopeTo.join(", ")}</dd>
          <dt className="font-bold text-slate-600">From</dt>
          <dd>{message.envelopeFrom}</dd>
          <dt className="font-bold text-slate-600">Received</dt>
          <dd>{formatInZone(message.receivedAt, club.timeZone)}</dd>
          {message.attachments.length > 0 && (
            <>
              <dt className="font-bold text-slate-600">Attached</dt>
              <dd>{message.attachments.map((attachment) => `${attachment.filename} (${attachment.contentType})`).join(", ")}</dd>
            </>
          )}
        </dl>
      </Card>
      {message.htmlBody && (
        <Card title="HTML part">
          {/* A sandboxed frame: the message's HTML cannot run scripts or reach this page. */}
          <iframe title="The message's HTML part" sandbox="" srcDoc={message.htmlBody} className="h-[36rem] w-full rounded-lg border border-slate-200" />
        </Card>
      )}
      <Card title="Plain-text part">
        <pre className="whitespace-pre-wrap break-words font-mono text-sm" data-testid="text-part">
          {message.textBody ?? "(none)"}
        </pre>
      </Card>
    </>
  );
}
