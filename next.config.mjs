const dev = process.env.NODE_ENV === "development";

/**
 * Content-Security-Policy: only Echoline's own origin, and why each exception is there.
 * - script-src 'unsafe-inline': Next.js streams each page's server-component payload in inline
 *   <script> tags, and the root layout sets the theme before paint with one. Nonces would need a
 *   per-request proxy and every page rendered dynamically (the public pages are prerendered), so
 *   inline scripts are allowed and no script from any other origin is. No 'unsafe-eval' outside
 *   `next dev` (its hot reloader evaluates code).
 * - style-src 'unsafe-inline': @nivo and @xyflow position their SVG and nodes with style
 *   attributes (server-rendered too), and @xyflow adds a <style> element; a nonce cannot cover
 *   attributes.
 * - img-src data: blob:: small inline images (icons in CSS, canvas snapshots) are data, not code.
 * - font-src 'self': next/font/local serves the shipped woff2 files from /_next/static/media.
 * - connect-src 'self': the browser only calls Echoline's own API (plus the hot reloader's socket in dev).
 * - object-src 'none', base-uri 'self', form-action 'self', frame-ancestors 'none' (no one frames Echoline).
 */
const csp = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline'${dev ? " 'unsafe-eval'" : ""}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  `connect-src 'self'${dev ? " ws: wss:" : ""}`,
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const securityHeaders = [
  { key: "Content-Security-Policy", value: csp },
  // For browsers older than frame-ancestors.
  { key: "X-Frame-Options", value: "DENY" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  // No address leaves the site (article ids today, share links later). Not no-referrer: with it a
  // same-origin POST would carry `Origin: null` and fail the request helper's origin check.
  { key: "Referrer-Policy", value: "same-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  // These run only on the server and load native or worker-thread code that the bundler must not touch.
  serverExternalPackages: ["pdf-parse", "pg", "pg-boss", "natural", "pdfkit", "nodemailer", "bcryptjs"],
  poweredByHeader: false,
  experimental: {
    // forbidden() gives a real 403 page for a signed-in person without the permission.
    authInterrupts: true,
  },
  async headers() {
    return [
      { source: "/:path*", headers: securityHeaders },
      // HSTS only over HTTPS: `next start` speaks plain HTTP on loopback, so HTTPS means a TLS proxy in
      // front that says so in X-Forwarded-Proto. (Browsers ignore HSTS received over plain HTTP, so a
      // forged header on loopback changes nothing.)
      {
        source: "/:path*",
        has: [{ type: "header", key: "x-forwarded-proto", value: "https" }],
        headers: [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }],
      },
    ];
  },
};
export default nextConfig;
