import type { Metadata } from "next";
import Link from "next/link";
import { OfflineOverview } from "@/components/offline/offline-overview";
import { ConnectionStatus } from "@/components/offline/connection-status";

export const metadata: Metadata = { title: "Working offline" };

// A static page, kept on the phone when the app is first opened: it is what any address shows offline
// that was not kept, and it reads everything it lists from this phone, never from the server.
export const dynamic = "force-static";

export default function OfflinePage() {
  return (
    <div className="mx-auto w-full max-w-page px-gutter py-6">
      <header className="mb-6 flex flex-wrap items-center justify-between gap-3">
        <Link href="/rigs" className="text-xl font-bold text-spruce-800 no-underline hover:no-underline">
          Spanwright
        </Link>
        <ConnectionStatus />
      </header>
      <main id="main">
        <OfflineOverview />
      </main>
    </div>
  );
}
