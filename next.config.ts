import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Database drivers and the job queue stay Node modules, outside the bundle.
  serverExternalPackages: ["pg", "pg-boss"],
  poweredByHeader: false,
  // forbidden() renders the 403 page (src/app/forbidden.tsx).
  experimental: { authInterrupts: true },
};

export default nextConfig;
