"use client";

import { useState, type ReactNode } from "react";
import { Button, type ButtonTone } from "./button";
import { Dialog, DialogClose } from "./dialog";

interface ConfirmButtonProps {
  children: ReactNode;
  title: string;
  description: string;
  confirmLabel: string;
  tone?: ButtonTone;
  ariaLabel?: string;
  onConfirm: () => Promise<unknown> | void;
}

/** A button for an action that cannot be undone: it asks once, in words, before it acts. */
export function ConfirmButton({ children, title, description, confirmLabel, tone = "danger", ariaLabel, onConfirm }: ConfirmButtonProps) {
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  return (
    <Dialog
      open={open}
      onOpenChange={setOpen}
      title={title}
      description={description}
      trigger={
        <Button tone={tone} aria-label={ariaLabel}>
          {children}
        </Button>
      }
    >
      <div className="flex flex-wrap justify-end gap-3">
        <DialogClose asChild>
          <Button tone="secondary">Cancel</Button>
        </DialogClose>
        <Button
          tone={tone}
          disabled={busy}
          onClick={async () => {
            setBusy(true);
            await onConfirm();
            setBusy(false);
            setOpen(false);
          }}
        >
          {confirmLabel}
        </Button>
      </div>
    </Dialog>
  );
}
