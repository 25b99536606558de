import { RequestError } from "./http-errors";

// Request bodies are read by counting their bytes as they arrive, so that neither an announced length nor a
// chunked body without one can make the server hold more than the route takes.

const MiB = 1024 * 1024;
/** The largest JSON body any form sends is a rig with its Kit, well under 100 KiB. */
export const JSON_BODY_LIMIT = 1 * MiB;
/** The deepest JSON a form sends is about 6 levels; deeper nesting only costs stack in whoever walks it. */
export const JSON_DEPTH_LIMIT = 32;

export const mebibytes = (bytes: number) => `${(bytes / MiB).toFixed(1)} MiB`;

/** The body's bytes, or `tooLarge`'s error as soon as more than `limit` bytes are announced or have arrived. */
export async function readBodyBytes(request: Request, limit: number, tooLarge: (bytes: number) => RequestError): Promise<Uint8Array<ArrayBuffer>> {
  const announced = Number(request.headers.get("content-length") ?? "");
  if (Number.isFinite(announced) && announced > limit) throw tooLarge(announced);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(total);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.byteLength;
  }
  return bytes;
}

/** True when no array or object in the JSON text nests deeper than `limit`; a linear scan that skips strings. */
export function jsonDepthWithin(text: string, limit: number): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c) i++;
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x7b || c === 0x5b) {
      if (++depth > limit) return false;
    } else if (c === 0x7d || c === 0x5d) depth--;
  }
  return true;
}

/** True when some string in the value, or some key, passes the test. */
function someText(value: unknown, test: (text: string) => boolean): boolean {
  if (typeof value === "string") return test(value);
  if (Array.isArray(value)) return value.some((v) => someText(v, test));
  if (value !== null && typeof value === "object") return Object.entries(value).some(([key, v]) => test(key) || someText(v, test));
  return false;
}

/** True when some string in the value, or some key, holds a NUL character: PostgreSQL cannot store one in text. */
export const holdsNul = (value: unknown) => someText(value, (text) => text.includes("\u0000"));

/** True when some text holds half of a UTF-16 surrogate pair (JSON can say "\ud800"): it is no character, and UTF-8 cannot hold it. */
export const holdsLoneSurrogate = (value: unknown) =>
  someText(value, (text) => /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.test(text));

export const NUL_REFUSAL = "Nothing was saved: the text contains a NUL character (code 0), which no form can type. Remove it and send again.";
const SURROGATE_REFUSAL =
  "Nothing was saved: the text contains half of a character (an unpaired UTF-16 surrogate), which no form can type. Remove it and send again.";

/** A JSON body's bytes, at most JSON_BODY_LIMIT of them, unparsed (for parsing on a worker thread); else a 413 saying what is allowed. */
export function readJsonBytes(request: Request): Promise<Uint8Array<ArrayBuffer>> {
  return readBodyBytes(
    request,
    JSON_BODY_LIMIT,
    (size) => new RequestError(413, `The request body is ${mebibytes(size)}; a form's JSON may be at most ${JSON_BODY_LIMIT / MiB} MiB.`),
  );
}

/** A JSON body of at most JSON_BODY_LIMIT bytes and JSON_DEPTH_LIMIT levels, parsed; else a 400 or 413 saying what is allowed. */
export async function readJson(request: Request): Promise<unknown> {
  return parseJsonBytes(await readJsonBytes(request));
}

/** JSON text of at most JSON_DEPTH_LIMIT levels, with no NUL and no half character, parsed; else a 400 saying what is wrong. */
export function parseJsonBytes(bytes: Uint8Array): unknown {
  const text = new TextDecoder().decode(bytes);
  if (!jsonDepthWithin(text, JSON_DEPTH_LIMIT)) {
    throw new RequestError(400, `The request body nests lists or objects more than ${JSON_DEPTH_LIMIT} levels deep; no form sends that.`);
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new RequestError(400, "The request body is not valid JSON.");
  }
  if (holdsNul(value)) throw new RequestError(400, NUL_REFUSAL);
  if (holdsLoneSurrogate(value)) throw new RequestError(400, SURROGATE_REFUSAL);
  return value;
}
