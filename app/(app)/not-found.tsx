import type { Metadata } from "next";
import { NotFoundNotice } from "@/components/not-found-notice";

export const metadata: Metadata = { title: "Not found" };

// A row another crew owns, or none at all, inside the app's frame.
export default function AppNotFound() {
  return <NotFoundNotice />;
}
