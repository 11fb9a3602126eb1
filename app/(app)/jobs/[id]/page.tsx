import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getJob } from '@/db/queries/jobs';
import { listParts } from '@/db/queries/parts';
import { getShopSettings } from '@/db/queries/shops';
import { EmptyState } from '@/components/ui/empty-state';
import { requirePageUser } from '@/lib/auth/session';
import { formatLength } from '@/lib/units/format-length';

export const metadata: Metadata = { title: 'Cut list' };

export default async function JobPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser('jobs:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const db = await getDb();
  const [job, settings] = await Promise.all([getJob(db, user.shopId, id.data), getShopSettings(db, user.shopId)]);
  if (!job || !settings) notFound();
  const parts = await listParts(db, user.shopId, job.id);
  const len = (mm: number) => formatLength(mm, settings.units);

  return (
    <div>
      <section aria-labelledby="cut-list" className="mb-8">
        <h2 id="cut-list" className="mb-3">Cut list</h2>
        {parts.length === 0 ? (
          <EmptyState title="No parts yet.">Parts come from typed rows, an uploaded file, or a drawer schedule.</EmptyState>
        ) : (
          <div className="card overflow-x-auto">
            <table className="data-table" aria-label="Cut list">
              <thead>
                <tr>
                  <th>Part</th>
                  <th className="num">Qty</th>
                  <th className="num">Length</th>
                  <th className="num">Width</th>
                  <th className="num">Thickness</th>
                  <th>Material</th>
                  <th>Grain</th>
                </tr>
              </thead>
              <tbody>
                {parts.map((p) => (
                  <tr key={p.id}>
                    <td className="font-medium">{p.label}</td>
                    <td className="num">{p.quantity}</td>
                    <td className="num">{len(p.lengthMm)}</td>
                    <td className="num">{len(p.widthMm)}</td>
                    <td className="num">{len(p.thicknessMm)}</td>
                    <td>{p.material}</td>
                    <td>{p.grain === 'along-length' ? 'Along length' : 'Either way'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </div>
  );
}
