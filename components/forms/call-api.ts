export type ApiAnswer =
  | { ok: true; body: Record<string, unknown> }
  | { ok: false; error: string; fieldErrors: Record<string, string>; status: number; body: Record<string, unknown> };

/**
 * One request to a route handler: a JSON body, or a FormData body (sent as the browser encodes it, so no
 * content-type header is set here). Gives the parsed answer, or the server's own words and field errors on failure.
 */
export async function callApi(method: "POST" | "PATCH" | "PUT" | "DELETE", url: string, body?: unknown): Promise<ApiAnswer> {
  const init: RequestInit = { method };
  if (body instanceof FormData) init.body = body;
  else if (body !== undefined) {
    init.body = JSON.stringify(body);
    init.headers = { "content-type": "application/json" };
  }
  try {
    const response = await fetch(url, init);
    const parsed = (await response.json().catch(() => ({}))) as Record<string, unknown>;
    if (response.ok) return { ok: true, body: parsed };
    return {
      ok: false,
      error: typeof parsed.error === "string" ? parsed.error : `The server answered ${response.status}; nothing was changed.`,
      fieldErrors: (parsed.fieldErrors as Record<string, string> | undefined) ?? {},
      status: response.status,
      body: parsed,
    };
  } catch {
    return {
      ok: false,
      error: "The server could not be reached: check the connection and try again. Nothing was changed.",
      fieldErrors: {},
      status: 0,
      body: {},
    };
  }
}

/** A GET through a route handler for TanStack Query: the parsed body, or an Error carrying the server's own words. */
export async function getJson<T>(url: string): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, { headers: { accept: "application/json" } });
  } catch {
    throw new Error("The server could not be reached: check the connection and try again.");
  }
  const body = (await response.json().catch(() => ({}))) as Record<string, unknown>;
  if (!response.ok) throw new Error(typeof body.error === "string" ? body.error : `The server answered ${response.status}.`);
  return body as T;
}
