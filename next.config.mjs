/** @type {import('next').NextConfig} */
const nextConfig = {
  // Packages with native bindings or Node-only internals stay out of the server bundle.
  serverExternalPackages: ["knex", "pg", "@node-rs/argon2", "nodemailer"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
