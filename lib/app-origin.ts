import { headers } from "next/headers";

/** The site's public address for links in e-mails: APP_ORIGIN in a deployment, else the request's own. */
export function appOrigin(request: Request): string {
  return process.env.APP_ORIGIN || new URL(request.url).origin;
}

/** The same for a page (the rig card's QR code), from the request's headers as Next.js reads them. */
export async function pageOrigin(): Promise<string> {
  if (process.env.APP_ORIGIN) return process.env.APP_ORIGIN;
  const h = await headers();
  return `${h.get("x-forwarded-proto") ?? "http"}://${h.get("x-forwarded-host") ?? h.get("host")}`;
}
