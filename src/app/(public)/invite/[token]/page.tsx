import type { Metadata } from "next";
import Link from "next/link";
import { roleLabels } from "@/lib/roles";
import { findOpenInvitation } from "@/server/services/accounts";
import { AcceptInvitationForm } from "./accept-form";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await findOpenInvitation(token);
  if (!invitation) {
    return (
      <>
        <h1 className="mb-2">This invitation has expired</h1>
        <p className="text-slate-700">
          Invitation links work once and for 14 days. Ask a coordinator for a new one, or <Link href="/sign-in">sign in</Link> if you already have an account.
        </p>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-2">Welcome, {invitation.name}</h1>
      <p className="mb-4 text-slate-700">
        You are invited to the club on Guyline as <strong>{roleLabels[invitation.role]}</strong>
        {invitation.isMentor ? " and mentor" : ""}. Your sign-in e-mail is <strong>{invitation.email}</strong>.
      </p>
      <AcceptInvitationForm token={token} email={invitation.email} />
    </>
  );
}
