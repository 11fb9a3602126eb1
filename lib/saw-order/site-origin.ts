/**
 * The address people reach the server at, for QR codes a phone can open: the configured public URL (NEXTAUTH_URL)
 * when set, else the host the request came to (a proxy's forwarded host first).
 */
export function siteOrigin(headers: Pick<Headers, 'get'>, publicUrl: string | undefined): string {
  if (publicUrl) return new URL(publicUrl).origin;
  const host = headers.get('x-forwarded-host') ?? headers.get('host') ?? 'localhost:3000';
  const proto = headers.get('x-forwarded-proto') ?? 'http';
  return `${proto.split(',')[0].trim()}://${host.split(',')[0].trim()}`;
}
