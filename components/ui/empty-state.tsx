import type { ReactNode } from "react";

interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}

export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <section className="rounded-panel border-2 border-dashed border-ink-300 bg-white px-6 py-10 text-center">
      <h2 className="text-lg">{title}</h2>
      {children ? <div className="mx-auto mt-2 max-w-prose text-ink-600">{children}</div> : null}
      {action ? <div className="mt-5 flex justify-center">{action}</div> : null}
    </section>
  );
}
