import Link from "next/link";

/** The 404 page's words, inside the app's frame or on its own. */
export function NotFoundNotice() {
  return (
    <section aria-labelledby="not-found" className="max-w-prose space-y-3">
      <p className="text-sm font-semibold uppercase tracking-wide text-spruce-700">404 · not found</p>
      <h1 id="not-found">Nothing at this address</h1>
      <p className="text-ink-700">
        The page may have been removed, the link may be mistyped or cut short, or it belongs to a crew you are not in. Nothing you saved was changed.
      </p>
      <ul className="flex flex-wrap gap-x-6 gap-y-2">
        <li>
          <Link href="/rigs">Rigs</Link>
        </li>
        <li>
          <Link href="/kit">Kit</Link>
        </li>
        <li>
          <Link href="/slip-bench">Slip bench</Link>
        </li>
        <li>
          <Link href="/crew">Crew</Link>
        </li>
      </ul>
    </section>
  );
}
