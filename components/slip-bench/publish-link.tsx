"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/components/forms/call-api";
import { FormError } from "@/components/forms/form-error";

/** A lead publishes (or revokes) the read-only link to the crew's slip table. */
export function PublishLink({ published }: { published: { createdAt: string; createdBy: string } | null }) {
  const router = useRouter();
  const [url, setUrl] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function publish() {
    const answer = await callApi("POST", "/api/slip-table/link");
    if (!answer.ok) return setError(answer.error);
    setUrl(String(answer.body.url));
    router.refresh();
  }

  async function revoke() {
    const answer = await callApi("DELETE", "/api/slip-table/link");
    if (!answer.ok) return setError(answer.error);
    setUrl(null);
    router.refresh();
  }

  return (
    <div className="space-y-3">
      <p className="text-ink-600">
        Anyone with the link sees this slip table and its chart, read-only; nothing else of the crew. Publishing again makes a new link and stops the old one.
      </p>
      {published ? (
        <p>
          A link is live: published by {published.createdBy} on {new Date(published.createdAt).toISOString().slice(0, 10)}.
        </p>
      ) : (
        <p>No link is published.</p>
      )}
      {url ? <OneTimeLink url={url} /> : null}
      <FormError message={error} />
      <div className="flex flex-wrap gap-2">
        <Button tone="secondary" onClick={publish}>
          {published ? "Publish a new link" : "Publish a read-only link"}
        </Button>
        {published ? (
          <Button tone="danger" onClick={revoke}>
            Revoke the link
          </Button>
        ) : null}
      </div>
    </div>
  );
}

/** The new link, shown once: a copy button, and the link itself selectable where the browser allows no clipboard. */
function OneTimeLink({ url }: { url: string }) {
  const [copied, setCopied] = useState<"yes" | "no" | null>(null);
  async function copy() {
    try {
      await navigator.clipboard.writeText(url);
      setCopied("yes");
    } catch {
      setCopied("no");
    }
  }
  return (
    <div className="space-y-2 rounded-control bg-info-100 p-3 text-info-700">
      <p>Copy the link now: it is shown only once.</p>
      <code className="block break-all">{url}</code>
      <div className="flex flex-wrap items-center gap-3">
        <Button tone="secondary" onClick={copy}>
          Copy the link
        </Button>
        <span role="status">
          {copied === "yes" ? "Copied." : copied === "no" ? "This browser would not copy it: select the link above and copy it by hand." : ""}
        </span>
      </div>
    </div>
  );
}
