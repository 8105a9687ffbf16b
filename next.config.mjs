/** @type {import('next').NextConfig} */
const nextConfig = {
  // Leeway is self-hosted: no telemetry beacons, no remote images.
  poweredByHeader: false,
  images: { unoptimized: true },
  // The libSQL client has a native part; keep it out of the server bundle.
  serverExternalPackages: ["@libsql/client", "libsql"],
};

export default nextConfig;
