/** One request to a route handler from a button: the parsed body, or the server's own words on failure. */
export async function callApi(method: "POST" | "PATCH" | "DELETE", url: string, body?: unknown): Promise<{ ok: true; body: Record<string, unknown> } | { ok: false; error: string }> {
  try {
    const response = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const parsed = (await response.json().catch(() => ({}))) as Record<string, unknown>;
    if (response.ok) return { ok: true, body: parsed };
    return { ok: false, error: typeof parsed.error === "string" ? parsed.error : `The server answered ${response.status}; nothing was changed.` };
  } catch {
    return { ok: false, error: "The server could not be reached: check the connection and try again." };
  }
}
