/** @type {import('next').NextConfig} */
const nextConfig = {
  // Leeway is self-hosted: no telemetry beacons, no remote images.
  poweredByHeader: false,
  images: { unoptimized: true },
  // The libSQL client has a native part; keep it out of the server bundle.
  serverExternalPackages: ["@libsql/client", "libsql"],
  experimental: {
    // proxy.ts sees every request, so Next buffers request bodies for it and cuts them at 10 MB by
    // default; layer uploads go up to 64 MB (lib/layers/limits.ts), checked again in the handler.
    proxyClientMaxBodySize: "70mb",
  },
};

export default nextConfig;
