import type { NextConfig } from "next";
import { STATIC_SECURITY_HEADERS } from "./lib/security-headers";

const nextConfig: NextConfig = {
  // PGlite loads its WebAssembly and data files next to its own module, and pg has optional native
  // parts: both stay plain Node modules instead of being bundled.
  serverExternalPackages: ["@electric-sql/pglite", "pg", "@react-pdf/renderer"],
  poweredByHeader: false,
  // forbidden() renders app/forbidden.tsx with a 403 for a signed-in user of the wrong role.
  experimental: { authInterrupts: true },
  // Every response, pages and API; the pages' Content-Security-Policy (with a nonce) comes from proxy.ts.
  async headers() {
    return [{ source: "/:path*", headers: STATIC_SECURITY_HEADERS }];
  },
};

export default nextConfig;
