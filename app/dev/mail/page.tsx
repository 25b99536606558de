import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { mailboxDir, readMailbox } from "@/lib/mail/mailbox";

export const metadata: Metadata = { title: "Local mailbox" };
export const dynamic = "force-dynamic";

// Only while the local SMTP fake runs: in a real deployment DEV_MAILBOX_DIR is unset and this is a 404.
export default async function DevMailPage() {
  if (!mailboxDir()) notFound();
  const messages = await readMailbox();
  return (
    <main id="main" className="mx-auto max-w-page px-gutter py-8">
      <h1>Local mailbox</h1>
      <p className="mt-1 text-ink-600">Every message the app sent to the local SMTP fake, newest first. This page does not exist in a real deployment.</p>
      {messages.length === 0 ? <p className="mt-6">No messages yet.</p> : null}
      <ol className="mt-6 space-y-6">
        {messages.map((m) => (
          <li key={m.id}>
            <article aria-label={m.subject} className="rounded-panel bg-white p-5 shadow-panel">
              <h2 className="text-lg">{m.subject}</h2>
              <p className="text-sm text-ink-600">
                To {m.to.join(", ")} · from {m.from} · {new Date(m.receivedAt).toLocaleString("en-GB")}
              </p>
              <pre className="mt-3 whitespace-pre-wrap font-sans text-ink-800">{m.text}</pre>
            </article>
          </li>
        ))}
      </ol>
    </main>
  );
}
