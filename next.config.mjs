/** @type {import('next').NextConfig} */
const securityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Content-Security-Policy", value: "frame-ancestors 'none'" },
];

const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  typedRoutes: false,
  serverExternalPackages: ["pg", "nodemailer", "s3rver", "smtp-server", "mailparser"],
  // authInterrupts: forbidden() renders app/forbidden.tsx with a real 403 status.
  experimental: { serverActions: { bodySizeLimit: "60mb" }, authInterrupts: true },
  async headers() {
    return [
      // Embeds are the only routes other sites may frame.
      { source: "/((?!embed/).*)", headers: securityHeaders },
      {
        source: "/embed/:path*",
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
          { key: "Content-Security-Policy", value: "frame-ancestors *" },
        ],
      },
    ];
  },
};

export default nextConfig;
