/** @type {import('next').NextConfig} */
const nextConfig = {
  // These run only on the server and load native or worker-thread code that the bundler must not touch.
  serverExternalPackages: ["pdf-parse", "pg", "pg-boss", "natural", "pdfkit", "nodemailer", "bcryptjs"],
  poweredByHeader: false,
  experimental: {
    // forbidden() gives a real 403 page for a signed-in person without the permission.
    authInterrupts: true,
  },
};
export default nextConfig;
