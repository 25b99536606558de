"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { classNames } from "@/lib/class-names";

export const APP_SECTIONS = [
  { href: "/rigs", label: "Rigs" },
  { href: "/kit", label: "Kit" },
  { href: "/slip-bench", label: "Slip bench" },
  { href: "/sites", label: "Sites" },
  { href: "/crew", label: "Crew" },
] as const;

/** The product's sections; a rail on a desktop, a row of large tabs on a phone. */
export function AppNav() {
  const pathname = usePathname();
  return (
    // On a phone the tabs wrap onto a second row rather than run off the screen.
    <nav aria-label="Sections">
      <ul className="flex flex-wrap gap-1 md:flex-col">
        {APP_SECTIONS.map((section) => {
          const current = pathname === section.href || pathname.startsWith(`${section.href}/`);
          return (
            <li key={section.href}>
              <Link
                href={section.href}
                aria-current={current ? "page" : undefined}
                className={classNames(
                  "flex min-h-target items-center whitespace-nowrap rounded-control px-3 font-semibold no-underline hover:no-underline md:px-4",
                  current ? "bg-spruce-700 text-white" : "text-ink-700 hover:bg-ink-100",
                )}
              >
                {section.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
