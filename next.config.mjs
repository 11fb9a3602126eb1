/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite ships its own wasm and data files; bundling would copy ~15 MB into static media.
  serverExternalPackages: ['@electric-sql/pglite', 'pg'],
  poweredByHeader: false,
  // `npm test` type-checks the whole project with `tsc --noEmit`; the build does not repeat it.
  typescript: { ignoreBuildErrors: true },
};

export default nextConfig;
