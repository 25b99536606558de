import { z } from "zod";
import { RequestError } from "@/lib/http-errors";

const Uuid = z.uuid();

/** True when the value is a uuid (RFC 9562, as zod checks it): only such a value can name a row. */
export const isUuid = (value: unknown): value is string => Uuid.safeParse(value).success;

/** A row id from the URL: anything that is not a uuid names no row, so it answers 404 like a missing one. */
export function rowId(id: string, what: string): string {
  if (!isUuid(id)) throw new RequestError(404, `No such ${what} in this crew.`);
  return id;
}
