import Link from 'next/link';

/** What a missing page says, in the app's own look (Next's built-in page carries an inline style the CSP refuses). */
export function NotFoundMessage({ home }: { home: string }) {
  return (
    <div className="mx-auto max-w-lg py-16 text-center">
      <p className="font-mono text-5xl font-semibold text-oak">404</p>
      <h1 className="mt-3">Nothing here</h1>
      <p className="mt-2 text-sm text-graphite-mute">This page does not exist, or it is not one you may open.</p>
      <Link href={home} className="btn-quiet mt-6 no-underline">
        Back to the start
      </Link>
    </div>
  );
}
