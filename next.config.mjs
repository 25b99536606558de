/** @type {import('next').NextConfig} */
const nextConfig = {
  // Packages with native bindings or Node-only internals stay out of the server bundle (pdfkit reads its font data beside its own files).
  serverExternalPackages: ["knex", "pg", "@node-rs/argon2", "nodemailer", "pdfkit"],
  // The test run builds apart from `npm start`, so both can run side by side.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
