/** @type {import('next').NextConfig} */
const nextConfig = {
  // A second build folder lets two builds of one checkout run side by side (tests/helpers/global-setup.ts reads the same variable).
  distDir: process.env.GLOWBENCH_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
  serverExternalPackages: ["better-sqlite3", "sharp", "smtp-server", "nodemailer", "mailparser", "@react-pdf/renderer"],
  async headers() {
    // The Content-Security-Policy carries a per-request nonce, so proxy.ts sets it; these are static.
    return [
      {
        source: "/:path*",
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
        ],
      },
    ];
  },
};

export default nextConfig;
