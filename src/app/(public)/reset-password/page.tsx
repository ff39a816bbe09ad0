import type { Metadata } from "next";
import { RequestSignInHelpForm } from "./forms";

export const metadata: Metadata = { title: "Sign-in help" };

export default function SignInHelpPage() {
  return (
    <>
      <h1 className="mb-2">Forgot your password?</h1>
      <p className="mb-4 text-slate-700">Give the e-mail address of your account and Guyline sends a link to choose a new password.</p>
      <RequestSignInHelpForm />
    </>
  );
}
