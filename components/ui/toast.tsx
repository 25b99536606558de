"use client";

import * as RadixToast from "@radix-ui/react-toast";
import { createContext, useCallback, useContext, useState, type ReactNode } from "react";
import { classNames } from "@/lib/class-names";

export type ToastTone = "ok" | "danger" | "info";

interface ToastMessage {
  id: number;
  title: string;
  description?: string;
  tone: ToastTone;
}

type Notify = (message: Omit<ToastMessage, "id" | "tone"> & { tone?: ToastTone }) => void;

const ToastContext = createContext<Notify>(() => undefined);

const toneClasses: Record<ToastTone, string> = {
  ok: "border-l-8 border-spruce-600",
  danger: "border-l-8 border-danger-600",
  info: "border-l-8 border-info-700",
};

/** Short confirmations and failures, announced to screen readers and dismissed by swipe or Escape. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [messages, setMessages] = useState<ToastMessage[]>([]);
  const notify = useCallback<Notify>((message) => {
    setMessages((list) => [...list, { id: Date.now() + Math.random(), tone: "info", ...message }]);
  }, []);
  return (
    <ToastContext.Provider value={notify}>
      <RadixToast.Provider swipeDirection="right" duration={6000}>
        {children}
        {messages.map((m) => (
          <RadixToast.Root
            key={m.id}
            onOpenChange={(open) => !open && setMessages((list) => list.filter((x) => x.id !== m.id))}
            className={classNames("rounded-panel bg-white p-4 shadow-panel", toneClasses[m.tone])}
          >
            <RadixToast.Title className="font-semibold">{m.title}</RadixToast.Title>
            {m.description ? <RadixToast.Description className="mt-1 text-sm text-ink-600">{m.description}</RadixToast.Description> : null}
          </RadixToast.Root>
        ))}
        <RadixToast.Viewport className="fixed bottom-0 right-0 z-50 flex w-full max-w-sm flex-col gap-3 p-4" />
      </RadixToast.Provider>
    </ToastContext.Provider>
  );
}

export function useToast(): Notify {
  return useContext(ToastContext);
}
