import type { Metadata } from "next";
import Link from "next/link";
import { findOpenReset } from "@/server/services/sign-in-help";
import { ResetPasswordForm } from "../forms";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const reset = await findOpenReset(token);
  if (!reset) {
    return (
      <>
        <h1 className="mb-2">This link has expired</h1>
        <p className="text-slate-700">
          A link to choose a new password works once, for an hour. <Link href="/reset-password">Ask for a new one</Link>.
        </p>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-2">Choose a new password</h1>
      <p className="mb-4 text-slate-700">
        For <strong>{reset.email}</strong>.
      </p>
      <ResetPasswordForm token={token} email={reset.email} />
    </>
  );
}
