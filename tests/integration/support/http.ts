// A small HTTP client for the integration suites: it keeps the session cookie like a browser and
// sends this site's Origin on every request, as the app's own pages do.
const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3100";

export class AppClient {
  private readonly cookies = new Map<string, string>();

  constructor(readonly baseUrl: string = APP_URL) {}

  static async signedIn(email: string, password: string): Promise<AppClient> {
    const client = new AppClient();
    const response = await client.post("/api/auth/sign-in", { email, password });
    if (response.status !== 200) throw new Error(`sign-in as ${email} answered ${response.status}: ${await response.text()}`);
    return client;
  }

  async request(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Response> {
    const init: RequestInit = { method, redirect: "manual", headers: { origin: this.baseUrl, ...headers } };
    const h = init.headers as Record<string, string>;
    if (this.cookies.size) h.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
    // Form data, text, bytes and streams go as they are (a stream chunked, with no Content-Length); anything else as JSON.
    if (body instanceof FormData || typeof body === "string") init.body = body;
    else if (body instanceof Uint8Array) init.body = new Uint8Array(body);
    else if (body instanceof ReadableStream) Object.assign(init, { body, duplex: "half" });
    else if (body !== undefined) {
      init.body = JSON.stringify(body);
      h["content-type"] = "application/json";
    }
    const response = await fetch(new URL(path, this.baseUrl), init);
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const [name, ...value] = pair.split("=");
      const text = value.join("=");
      if (text) this.cookies.set(name.trim(), text);
      else this.cookies.delete(name.trim());
    }
    return response;
  }

  get(path: string) {
    return this.request("GET", path);
  }
  post(path: string, body?: unknown, headers?: Record<string, string>) {
    return this.request("POST", path, body, headers);
  }
  patch(path: string, body?: unknown) {
    return this.request("PATCH", path, body);
  }
  put(path: string, body?: unknown) {
    return this.request("PUT", path, body);
  }
  delete(path: string) {
    return this.request("DELETE", path);
  }

  /** Chooses the crew later requests work in, as the crew switcher does. */
  async switchCrew(crewId: string): Promise<Response> {
    return this.post("/api/crews/current", { crewId });
  }
}
