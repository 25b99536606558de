"use client";

import { useState, type ReactNode } from "react";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";

/** One TanStack Query client per browser tab, for the pages that fetch through the route handlers. */
export function QueryProvider({ children }: { children: ReactNode }) {
  // Lists refresh when a person comes back to the tab; a failed read is tried once more, not three times.
  const [client] = useState(() => new QueryClient({ defaultOptions: { queries: { retry: 1, staleTime: 10_000 } } }));
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
