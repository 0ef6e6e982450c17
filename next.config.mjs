/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["knex", "pg", "pg-boss", "bcryptjs", "puppeteer-core", "nodemailer", "jsdom", "dompurify", "docx", "@signpdf/signpdf", "@signpdf/placeholder-pdf-lib", "@signpdf/signer-p12", "node-forge", "pdf-lib", "qrcode"],
  poweredByHeader: false,
  typedRoutes: false,
  // A second build folder lets a developer iterate on a running build while `npm test` uses .next.
  distDir: process.env.PP_NEXT_DIST_DIR || ".next",
};

export default nextConfig;
