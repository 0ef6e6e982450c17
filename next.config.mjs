/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["knex", "pg", "pg-boss", "bcryptjs", "puppeteer-core", "nodemailer"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
