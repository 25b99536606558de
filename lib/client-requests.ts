// How the app's client components call its route handlers: JSON or a form in, the answer or its error out.

export type Answer<T> = { ok: true; data: T } | { ok: false; status: number; error: string; fieldErrors: Record<string, string> };

export async function send<T>(url: string, method: "POST" | "PATCH" | "DELETE", body?: unknown): Promise<Answer<T>> {
  const init: RequestInit = { method };
  if (body instanceof FormData) init.body = body;
  else if (body !== undefined) {
    init.body = JSON.stringify(body);
    init.headers = { "content-type": "application/json" };
  }
  let response: Response;
  try {
    response = await fetch(url, init);
  } catch {
    return { ok: false, status: 0, error: "The server could not be reached; nothing was saved. Check the connection and try again.", fieldErrors: {} };
  }
  const json = await response.json().catch(() => null);
  if (response.ok) return { ok: true, data: json as T };
  return {
    ok: false,
    status: response.status,
    error: json?.error ?? `The server answered ${response.status}; nothing was saved.`,
    fieldErrors: json?.fieldErrors ?? {},
  };
}
