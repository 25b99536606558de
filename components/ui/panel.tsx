import type { ReactNode } from "react";

/** A titled white panel: one part of a page (figures, a form, a list). */
export function Panel({ title, children, id }: { title: string; children: ReactNode; id?: string }) {
  return (
    <section aria-labelledby={id} className="space-y-3 rounded-panel border border-ink-200 bg-white p-4 shadow-panel">
      <h2 id={id} className="text-lg">
        {title}
      </h2>
      {children}
    </section>
  );
}
