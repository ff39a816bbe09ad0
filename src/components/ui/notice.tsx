import type { ReactNode } from "react";

type Tone = "info" | "success" | "caution" | "danger";

const tones: Record<Tone, string> = {
  info: "border-slate-300 bg-white text-slate-800",
  success: "border-copper-300 bg-copper-50 text-copper-900",
  // Amber and red are kept for safety and errors, as product.md asks.
  caution: "border-caution-600 bg-caution-50 text-caution-800",
  danger: "border-danger-600 bg-danger-50 text-danger-800",
};

export function Notice({ tone = "info", title, children }: { tone?: Tone; title?: string; children?: ReactNode }) {
  return (
    <div role={tone === "danger" ? "alert" : "status"} className={`mb-4 rounded-lg border-l-4 p-4 ${tones[tone]}`}>
      {title && <p className="font-bold">{title}</p>}
      {children}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-slate-300 bg-white p-6 text-center text-slate-700">
      <p className="font-bold text-slate-800">{title}</p>
      {children && <div className="mt-1 text-sm">{children}</div>}
    </div>
  );
}

export function Card({ title, children, actions }: { title?: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="mb-6 rounded-xl border border-slate-200 bg-white p-4 shadow-sm sm:p-6">
      {(title || actions) && (
        <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
          {title && <h2>{title}</h2>}
          {actions}
        </div>
      )}
      {children}
    </section>
  );
}

export function PageHeader({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-center justify-between gap-3">
      <h1>{title}</h1>
      {children && <div className="flex flex-wrap gap-2">{children}</div>}
    </div>
  );
}
