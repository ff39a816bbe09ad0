import Link from "next/link";
import { Logo } from "@/components/shell/logo";

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16 text-center">
      <Logo size={56} />
      <h1 className="mt-4">Not for your role (403)</h1>
      <p className="mt-2 text-slate-700">
        Your role in the club does not include this page. If you think it should, ask one of the club&apos;s coordinators.
      </p>
      <p className="mt-6">
        <Link href="/">Back to the home page</Link>
      </p>
    </main>
  );
}
