import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Card, EmptyState, PageHeader } from "@/components/ui/notice";
import { formatInZone } from "@/lib/time";
import { getClubSettings } from "@/server/services/accounts";
import { devInboxOpen, listCapturedMail } from "@/server/services/dev-inbox";
import { requirePageViewer } from "@/server/session";

export const metadata: Metadata = { title: "Development inbox" };
export const dynamic = "force-dynamic";

export default async function DevInboxPage() {
  const { actor } = await requirePageViewer("devInbox.view");
  if (!devInboxOpen(actor)) notFound();
  const [messages, club] = await Promise.all([listCapturedMail(actor), getClubSettings()]);
  return (
    <>
      <PageHeader title="Development inbox" />
      <p className="mb-4 max-w-3xl text-slate-700">
        Every message this deployment sent, as the local mail server caught it. Nothing here reached a real mailbox. Production deployments send through the
        club&apos;s mail service and have no such page.
      </p>
      {messages.length === 0 ? (
        <EmptyState title="No messages yet." />
      ) : (
        <Card>
          <ul className="divide-y divide-slate-200" aria-label="Captured messages">
            {messages.map((message) => (
              <li key={message.id} className="py-2">
                <Link href={`/dev/inbox/${message.id}`} className="font-bold">
                  {message.subject}
                </Link>
                <p className="text-sm text-slate-600">
                  To {message.envelopeTo.join(", ")} · {formatInZone(message.receivedAt, club.timeZone)}
                </p>
              </li>
            ))}
          </ul>
        </Card>
      )}
    </>
  );
}
