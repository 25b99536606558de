import { NextResponse } from "next/server";
import { RequestError } from "@/lib/http-errors";

type Outcome<T> = { outcome: "done"; value: T; replayed: boolean } | { outcome: "not_found" } | { outcome: "refused"; message: string };

/**
 * The answer to an on-site write: 201 when it landed now, 200 when the same key had landed before
 * (a replay changes nothing), 409 with the reason when the revision no longer takes it.
 */
export function onSiteAnswer<T>(done: Outcome<T>, notFound: string, body: (value: T) => Promise<Record<string, unknown>>): Promise<NextResponse> {
  if (done.outcome === "not_found") throw new RequestError(404, notFound);
  if (done.outcome === "refused") throw new RequestError(409, done.message);
  return body(done.value).then((json) => NextResponse.json({ ...json, replayed: done.replayed }, { status: done.replayed ? 200 : 201 }));
}
