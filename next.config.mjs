/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite ships its own wasm and data files; bundling would copy ~15 MB into static media. The mail packages use
  // Node built-ins (net, tls, streams) and run only on the server; the PDF renderer loads its layout engine and fonts
  // at run time in node.
  serverExternalPackages: ['@electric-sql/pglite', 'pg', 'pino', 'pino-pretty', 'nodemailer', 'smtp-server', 'postal-mime', '@react-pdf/renderer'],
  poweredByHeader: false,
  // Several builds can live side by side (one per developer working in the same tree); the default is .next.
  distDir: process.env.KERFWISE_DIST_DIR || '.next',
  // Static files and anything else the proxy and the route wrapper do not answer (lib/security-headers.ts sets
  // these, with the page's CSP and HSTS over https, on pages and API answers).
  async headers() {
    return [
      {
        source: '/:path*',
        headers: [
          { key: 'X-Content-Type-Options', value: 'nosniff' },
          { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
          { key: 'X-Frame-Options', value: 'DENY' },
        ],
      },
    ];
  },
};

export default nextConfig;
