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
    <nav aria-label="Sections" className="overflow-x-auto">
      <ul className="flex gap-1 md:flex-col">
        {APP_SECTIONS.map((section) => {
          const current = pathname === section.href || pathname.startsWith(`${section.href}/`);
          return (
            <li key={section.href}>
              <Link
                href={section.href}
                aria-current={current ? "page" : undefined}
                className={classNames(
                  "flex min-h-target items-center whitespace-nowrap rounded-control px-4 font-semibold no-underline hover:no-underline",
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
