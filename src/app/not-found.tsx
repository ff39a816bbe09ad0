import Link from "next/link";
import { Logo } from "@/components/shell/logo";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16 text-center">
      <Logo size={56} />
      <h1 className="mt-4">Page not found (404)</h1>
      <p className="mt-2 text-slate-700">There is nothing at this address. It may have been moved, or the link has a typo.</p>
      <p className="mt-6">
        <Link href="/">Back to the home page</Link>
      </p>
    </main>
  );
}
