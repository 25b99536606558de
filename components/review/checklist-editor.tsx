"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/forms/form-error";
import { callApi } from "@/components/forms/call-api";

interface Item {
  id?: string;
  text: string;
}

/** The crew's checklist items in order; leads add, reword, move and remove them. Others read them. */
export function ChecklistEditor({ items: saved, editable }: { items: { id: string; text: string }[]; editable: boolean }) {
  const router = useRouter();
  const [items, setItems] = useState<Item[]>(saved);
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [status, setStatus] = useState<string | null>(null);
  if (!editable) {
    return saved.length ? (
      <ol className="list-decimal space-y-1 pl-6">
        {saved.map((i) => (
          <li key={i.id}>{i.text}</li>
        ))}
      </ol>
    ) : (
      <p>No checklist yet: a lead or owner writes it here.</p>
    );
  }
  const change = (index: number, next: Item | null) => setItems((all) => all.flatMap((item, i) => (i === index ? (next ? [next] : []) : [item])));
  const move = (index: number, by: -1 | 1) =>
    setItems((all) => {
      const next = [...all];
      [next[index], next[index + by]] = [next[index + by], next[index]];
      return next;
    });
  return (
    <form
      className="space-y-4"
      onSubmit={async (e) => {
        e.preventDefault();
        const answer = await callApi("PUT", "/api/crew/checklist", { items });
        if (!answer.ok) {
          setFieldErrors(answer.fieldErrors);
          return setError(answer.error);
        }
        setError(null);
        setFieldErrors({});
        setItems(answer.body.items as Item[]);
        setStatus("Checklist saved. Runs already started keep the items they started with.");
        router.refresh();
      }}
    >
      <ol className="space-y-3">
        {items.map((item, i) => (
          <li key={item.id ?? `new-${i}`} className="flex flex-wrap items-end gap-2">
            <div className="min-w-0 flex-1">
              <Field
                label={`Item ${i + 1}`}
                value={item.text}
                onChange={(e) => change(i, { ...item, text: e.target.value })}
                error={fieldErrors[`items.${i}.text`]}
                maxLength={300}
              />
            </div>
            <Button tone="quiet" aria-label={`Move item ${i + 1} up`} disabled={i === 0} onClick={() => move(i, -1)}>
              ↑
            </Button>
            <Button tone="quiet" aria-label={`Move item ${i + 1} down`} disabled={i === items.length - 1} onClick={() => move(i, 1)}>
              ↓
            </Button>
            <Button tone="secondary" onClick={() => change(i, null)}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      <div className="flex flex-wrap gap-2">
        <Button tone="secondary" onClick={() => setItems((all) => [...all, { text: "" }])}>
          Add an item
        </Button>
        <Button type="submit">Save the checklist</Button>
      </div>
      {status ? <p role="status">{status}</p> : null}
      <FormError message={error} />
    </form>
  );
}
