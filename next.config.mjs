/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["knex", "pg", "nodemailer", "bcryptjs"],
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
