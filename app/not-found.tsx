import type { Metadata } from "next";
import Link from "next/link";
import { NotFoundNotice } from "@/components/not-found-notice";

export const metadata: Metadata = { title: "Not found" };

// Any address the app does not have.
export default function NotFound() {
  return (
    <main id="main" className="mx-auto max-w-page px-gutter py-10">
      <Link href="/" className="mb-8 block text-xl font-bold text-spruce-800 no-underline">
        Spanwright
      </Link>
      <NotFoundNotice />
    </main>
  );
}
