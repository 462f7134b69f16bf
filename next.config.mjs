/** @type {import('next').NextConfig} */
const nextConfig = {
  // Native or dynamic-require packages stay out of the server bundle.
  serverExternalPackages: ["sequelize", "mariadb", "mysql2", "@node-rs/argon2", "umzug"],
  poweredByHeader: false,
  reactStrictMode: true,
  experimental: { authInterrupts: true },
};

export default nextConfig;
