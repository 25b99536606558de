import { RequestError } from "@/lib/http-errors";

export const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A row id from the URL: anything that is not a uuid names no row, so it answers 404 like a missing one. */
export function rowId(id: string, what: string): string {
  if (!UUID_PATTERN.test(id)) throw new RequestError(404, `No such ${what} in this crew.`);
  return id;
}
