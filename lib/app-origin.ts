/** The site's public address for links in e-mails: APP_ORIGIN in a deployment, else the request's own. */
export function appOrigin(request: Request): string {
  return process.env.APP_ORIGIN || new URL(request.url).origin;
}
