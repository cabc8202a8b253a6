/** @type {import('next').NextConfig} */
const dev = process.env.NODE_ENV !== "production";

// One policy for every page; only the frame rule differs for /embed/*. Next's hydration scripts are
// inline, hence 'unsafe-inline' for scripts (nonces would make every page dynamic); nothing is loaded
// from another origin.
function csp(frameAncestors) {
  return [
    "default-src 'self'",
    `script-src 'self' 'unsafe-inline'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    `connect-src 'self'${dev ? " ws:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    `frame-ancestors ${frameAncestors}`,
  ].join("; ");
}

const common = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=()" },
];
const securityHeaders = [
  ...common,
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
  { key: "Content-Security-Policy", value: csp("'none'") },
];
const embedHeaders = [...common, { key: "Content-Security-Policy", value: csp("*") }];

// npm test builds into its own folder (.next-test) so it never replaces the files a running `npm start` serves.
const distDir = process.env.NEXT_DIST_DIR || ".next";
if (!/^\.next[a-z0-9-]*$/.test(distDir))
  throw new Error(`NEXT_DIST_DIR must look like .next or .next-test, got ${distDir}`);

const nextConfig = {
  distDir,
  reactStrictMode: true,
  poweredByHeader: false,
  typedRoutes: false,
  serverExternalPackages: ["pg", "nodemailer", "s3rver", "smtp-server", "mailparser", "@resvg/resvg-js"],
  // authInterrupts: forbidden() renders app/forbidden.tsx with a real 403 status.
  experimental: { serverActions: { bodySizeLimit: "60mb" }, authInterrupts: true },
  async headers() {
    return [
      // Embeds are the only routes other sites may frame.
      { source: "/((?!embed/).*)", headers: securityHeaders },
      {
        source: "/embed/:path*",
        headers: embedHeaders,
      },
    ];
  },
};

export default nextConfig;
