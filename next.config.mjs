/** @type {import('next').NextConfig} */
const nextConfig = {
  // Native or dynamic-require packages stay out of the server bundle.
  serverExternalPackages: ["sequelize", "mariadb", "mysql2", "@node-rs/argon2", "umzug", "pdfkit"],
  poweredByHeader: false,
  // `npm test` runs `tsc --noEmit` over the whole project before it builds; checking twice costs minutes.
  typescript: { ignoreBuildErrors: true },
  reactStrictMode: true,
  experimental: { authInterrupts: true },
};

export default nextConfig;
