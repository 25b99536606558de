"use client";

import * as RadixDialog from "@radix-ui/react-dialog";
import type { ReactNode } from "react";

interface DialogProps {
  trigger: ReactNode;
  title: string;
  description?: string;
  open?: boolean;
  onOpenChange?: (open: boolean) => void;
  children: ReactNode;
}

/** A modal with focus trapped inside and Escape to close (Radix handles both). */
export function Dialog({ trigger, title, description, open, onOpenChange, children }: DialogProps) {
  return (
    <RadixDialog.Root open={open} onOpenChange={onOpenChange}>
      <RadixDialog.Trigger asChild>{trigger}</RadixDialog.Trigger>
      <RadixDialog.Portal>
        <RadixDialog.Overlay className="fixed inset-0 bg-ink-900/50" />
        <RadixDialog.Content className="fixed left-1/2 top-1/2 w-[min(92vw,32rem)] -translate-x-1/2 -translate-y-1/2 rounded-panel bg-white p-6 shadow-panel">
          <RadixDialog.Title className="text-xl font-semibold">{title}</RadixDialog.Title>
          {description ? <RadixDialog.Description className="mt-1 text-ink-600">{description}</RadixDialog.Description> : null}
          <div className="mt-4">{children}</div>
          <RadixDialog.Close
            className="absolute right-3 top-3 min-h-target min-w-target rounded-control text-xl text-ink-600 hover:bg-ink-100"
            aria-label="Close"
          >
            ×
          </RadixDialog.Close>
        </RadixDialog.Content>
      </RadixDialog.Portal>
    </RadixDialog.Root>
  );
}

export const DialogClose = RadixDialog.Close;
