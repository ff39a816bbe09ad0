import type { Metadata } from "next";
import Link from "next/link";
import { alwaysSentSummary, mailCategoryTopics } from "@/lib/mail/categories";
import { readUnsubscribeToken } from "@/server/services/mail-preferences";
import { UnsubscribeButton } from "./unsubscribe-button";

export const metadata: Metadata = { title: "E-mail choices" };
export const dynamic = "force-dynamic";

// Opening the link changes nothing (mail scanners open links too); one click on the button does.
export default async function UnsubscribePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const claim = await readUnsubscribeToken(token);
  if (!claim) {
    return (
      <>
        <h1 className="mb-2">This link does not work</h1>
        <p className="text-slate-700">
          It may be incomplete. <Link href="/settings">Sign in and change your e-mail choices</Link> instead.
        </p>
      </>
    );
  }
  const topic = mailCategoryTopics[claim.category];
  return (
    <>
      <h1 className="mb-2">E-mails about {topic}</h1>
      <p className="mb-4 text-slate-700">
        For <strong>{claim.email}</strong>. {alwaysSentSummary}
      </p>
      <UnsubscribeButton token={token} topic={topic} subscribed={claim.subscribed} />
      <p className="mt-4 text-sm">
        All your choices are on the <Link href="/settings">settings page</Link>.
      </p>
    </>
  );
}
