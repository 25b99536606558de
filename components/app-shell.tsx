import Link from "next/link";
import type { ReactNode } from "react";
import { AppNav } from "./app-nav";
import { ConnectionStatus } from "./offline/connection-status";

interface AppShellProps {
  crewSwitcher?: ReactNode;
  accountMenu?: ReactNode;
  children: ReactNode;
}

/** The frame of every signed-in page: brand, crew switcher, account menu, sections, content; on paper only the content. */
export function AppShell({ crewSwitcher, accountMenu, children }: AppShellProps) {
  return (
    <div className="min-h-screen md:grid md:grid-cols-[theme(spacing.rail)_1fr] print:block print:min-h-0">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-white focus:p-3">
        Skip to content
      </a>
      <header className="border-b border-ink-200 bg-white md:min-h-screen md:border-b-0 md:border-r print:hidden">
        <div className="flex items-center justify-between gap-3 px-4 py-3 md:flex-col md:items-stretch">
          <Link href="/rigs" className="text-xl font-bold text-spruce-800 no-underline hover:no-underline">
            Spanwright
          </Link>
          {accountMenu}
        </div>
        {crewSwitcher ? <div className="px-4 pb-3">{crewSwitcher}</div> : null}
        <div className="px-4 pb-3">
          <ConnectionStatus />
        </div>
        <div className="px-2 pb-2 md:px-3">
          <AppNav />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-page px-gutter py-6 print:max-w-none print:p-0">
        {children}
      </main>
    </div>
  );
}
