"use client";

import { useRouter } from "next/navigation";

/** After a sign-in or a crew change: go to the page and re-read every server component on the way. */
export function useGoTo(path: string): () => void {
  const router = useRouter();
  return () => {
    router.replace(path);
    router.refresh();
  };
}
