import Link from "next/link";
import type { ButtonHTMLAttributes, ComponentProps } from "react";

type Variant = "primary" | "secondary" | "danger" | "quiet";

const variants: Record<Variant, string> = {
  primary: "bg-copper-700 text-white hover:bg-copper-800 disabled:bg-slate-400",
  secondary: "border border-slate-400 bg-white text-slate-900 hover:bg-slate-100 disabled:text-slate-400",
  danger: "bg-danger-600 text-white hover:bg-danger-800 disabled:bg-slate-400",
  quiet: "text-copper-700 hover:bg-copper-50 disabled:text-slate-400",
};

// Generous touch targets: at least 44 px high (WCAG 2.2 target size, with margin).
const base =
  "inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold no-underline transition-colors hover:no-underline disabled:cursor-not-allowed";

export function buttonClass(variant: Variant = "primary", extra = "") {
  return `${base} ${variants[variant]} ${extra}`;
}

export function Button({ variant = "primary", className = "", type = "button", ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button type={type} className={buttonClass(variant, className)} {...props} />;
}

export function ButtonLink({ variant = "primary", className = "", ...props }: ComponentProps<typeof Link> & { variant?: Variant }) {
  return <Link className={buttonClass(variant, className)} {...props} />;
}
