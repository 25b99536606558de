const development = process.env.NODE_ENV === "development";
// HSTS only where the site is served over HTTPS: a production build unless the local plain-http stack says otherwise.
const https = process.env.NODE_ENV === "production" && process.env.COOKIE_SECURE !== "false";

// Scripts and styles from this site only. Next.js inlines its boot scripts and styles, hence 'unsafe-inline'
// (a nonce would make every page dynamic); the development server also evaluates code and reloads over a WebSocket.
const contentSecurityPolicy = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline'${development ? " 'unsafe-eval'" : ""}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self' data:",
  `connect-src 'self'${development ? " ws: wss:" : ""}`,
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const securityHeaders = [
  // Link secrets (reset, invitation, shared table) sit in addresses: no other site sees them as a referrer.
  { key: "Referrer-Policy", value: "same-origin" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
  ...(https ? [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }] : []),
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Packages with native bindings or Node-only internals stay out of the server bundle (pdfkit reads its font data beside its own files).
  // esbuild bundles the service worker when the build prerenders its route.
  serverExternalPackages: ["knex", "pg", "@node-rs/argon2", "nodemailer", "pdfkit", "esbuild"],
  // The test run builds apart from `npm start`, so both can run side by side.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  typedRoutes: false,
  async headers() {
    return [
      { source: "/:path*", headers: securityHeaders },
      // An uploaded file is served with its own policy (sandbox), so that it never runs as one of our pages.
      { source: "/((?!api/uploads/).*)", headers: [{ key: "Content-Security-Policy", value: contentSecurityPolicy }] },
    ];
  },
};

export default nextConfig;
