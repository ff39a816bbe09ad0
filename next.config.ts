import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Database drivers and the job queue stay Node modules, outside the bundle.
  serverExternalPackages: ["pg", "pg-boss"],
  poweredByHeader: false,
};

export default nextConfig;
