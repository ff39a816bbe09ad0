import type { ReactNode } from "react";
import { Logo } from "@/components/shell/logo";

export default function PublicLayout({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-4 py-10">
      <div className="mb-6 flex items-center gap-3">
        <Logo size={48} />
        <div>
          <p className="text-2xl font-bold">Guyline</p>
          <p className="text-sm text-slate-600">Antenna days, gear and build sessions for the club</p>
        </div>
      </div>
      <div className="rounded-xl border border-slate-200 bg-white p-6 shadow-sm">{children}</div>
    </main>
  );
}
