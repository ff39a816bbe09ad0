"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { signOut } from "next-auth/react";
import { useState, type ReactNode } from "react";
import type { NavItem } from "@/server/navigation";
import { Logo } from "./logo";

interface AppShellProps {
  clubName: string;
  userName: string;
  roleLabel: string;
  navigation: NavItem[];
  children: ReactNode;
}

export function AppShell({ clubName, userName, roleLabel, navigation, children }: AppShellProps) {
  const pathname = usePathname();
  const [menuOpen, setMenuOpen] = useState(false);
  const isCurrent = (href: string) => pathname === href || pathname.startsWith(`${href}/`);

  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:p-2">
        Skip to the content
      </a>
      <header className="no-print bg-slate-800 text-white">
        <div className="mx-auto flex max-w-6xl items-center gap-3 px-4 py-2">
          <Link href="/" className="flex min-h-11 items-center gap-2 font-bold text-white no-underline hover:no-underline">
            <Logo size={36} />
            <span className="text-xl">Guyline</span>
            <span className="hidden text-sm font-normal text-slate-300 sm:inline">· {clubName}</span>
          </Link>
          <button
            type="button"
            className="ml-auto min-h-11 rounded-lg border border-slate-500 px-3 font-bold md:hidden"
            aria-expanded={menuOpen}
            aria-controls="main-navigation"
            onClick={() => setMenuOpen((open) => !open)}
          >
            Menu
          </button>
          <div className="ml-auto hidden items-center gap-3 text-sm md:flex">
            <span>
              {userName} <span className="text-slate-300">({roleLabel})</span>
            </span>
            <button type="button" className="min-h-11 rounded-lg px-3 font-bold text-copper-200 hover:bg-slate-700" onClick={() => signOut({ callbackUrl: "/sign-in" })}>
              Sign out
            </button>
          </div>
        </div>
        <nav id="main-navigation" aria-label="Main" className={`${menuOpen ? "block" : "hidden"} border-t border-slate-700 md:block`}>
          <ul className="mx-auto flex max-w-6xl flex-col px-2 md:flex-row md:flex-wrap">
            {navigation.map((item) => (
              <li key={item.href}>
                <Link
                  href={item.href}
                  aria-current={isCurrent(item.href) ? "page" : undefined}
                  onClick={() => setMenuOpen(false)}
                  className="flex min-h-11 items-center px-3 font-bold text-slate-100 no-underline hover:bg-slate-700 hover:no-underline aria-[current=page]:border-b-4 aria-[current=page]:border-copper-400 aria-[current=page]:text-white"
                >
                  {item.label}
                </Link>
              </li>
            ))}
            <li className="md:hidden">
              <button type="button" className="flex min-h-11 w-full items-center px-3 font-bold text-copper-200" onClick={() => signOut({ callbackUrl: "/sign-in" })}>
                Sign out ({userName})
              </button>
            </li>
          </ul>
        </nav>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-4 py-6">
        {children}
      </main>
    </div>
  );
}
