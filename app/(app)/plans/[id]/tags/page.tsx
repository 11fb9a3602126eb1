import { scopeOf } from '@/db/scope';
import { found } from '@/server/page-data';
import type { Metadata } from 'next';
import Link from 'next/link';
import { headers } from 'next/headers';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getSawOrder } from '@/db/queries/saw-steps';
import { PrintButton } from '@/components/saw-order/print-button';
import { TagSheets } from '@/components/part-tags/tag-sheets';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { LABEL_SHEETS, labelSheet } from '@/lib/saw-order/label-sheets';
import { partTagPath, partTags, tagText } from '@/lib/saw-order/part-tags';
import { qrPath } from '@/lib/saw-order/qr-path';
import { siteOrigin } from '@/lib/saw-order/site-origin';

export const metadata: Metadata = { title: 'Part tags' };

export default async function PartTagsPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ sheet?: string }> }) {
  const user = await requirePageUser('plans:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const order = await found(getSawOrder(scopeOf(await getDb(), user), id.data, { drafts: can(user.role, 'plans:write') }));
  const sheet = labelSheet((await searchParams).sheet);
  const origin = siteOrigin(await headers(), process.env.NEXTAUTH_URL);
  const items = partTags(order.document, order.parts).map((tag) => {
    const url = origin + partTagPath(order.id, tag);
    return { tag, url, text: tagText(tag, order.units), qr: qrPath(url) };
  });
  const unplaced = order.document.unplaced.length;

  return (
    <div>
      <div className="print:hidden">
        <Link href={`/plans/${order.id}/saw-order`} className="text-sm text-graphite-mute">
          ← Saw order
        </Link>
        <header className="mb-4 mt-2 flex flex-wrap items-end justify-between gap-4">
          <div>
            <h1>Part tags</h1>
            <p className="mt-1 text-sm text-graphite-soft">
              <span className="font-medium text-graphite">{order.job.name}</span> · {order.name} · {items.length} tag{items.length === 1 ? '' : 's'},
              one per part
              {unplaced > 0 && (
                <span className="text-brick">
                  {' '}
                  · {unplaced} part{unplaced === 1 ? '' : 's'} not placed get no tag
                </span>
              )}
            </p>
          </div>
          <div className="flex gap-2">
            <PrintButton label="Print tags" />
            <a className="btn-quiet" href={`/api/plans/${order.id}/tags-pdf?sheet=${sheet.id}`} download>
              Download PDF
            </a>
          </div>
        </header>
        <nav aria-label="Label sheet" className="mb-4 flex flex-wrap items-center gap-2">
          <span className="text-sm text-graphite-mute">Label sheet:</span>
          {LABEL_SHEETS.map((s) => (
            <Link
              key={s.id}
              href={`?sheet=${s.id}`}
              aria-current={s.id === sheet.id ? 'true' : undefined}
              className={`rounded-full border px-3 py-1 text-sm no-underline ${s.id === sheet.id ? 'border-oak bg-oak-wash text-oak-deep' : 'border-paper-edge bg-white text-graphite-soft hover:bg-paper-deep'}`}
            >
              {s.name}
            </Link>
          ))}
        </nav>
        <p className="mb-4 max-w-3xl text-xs text-graphite-mute">
          Print at 100 % (no “fit to page”) so the tags land on the labels, or download the PDF, which is made to the sheet’s exact size. Each QR code
          opens the part’s page: its job, plan and the piece it is cut from.
        </p>
      </div>
      {items.length === 0 ? (
        <p className="card px-4 py-6 text-sm text-graphite-mute">This plan places no parts, so there are no tags to print.</p>
      ) : (
        <TagSheets items={items} sheet={sheet} jobName={order.job.name} />
      )}
    </div>
  );
}
