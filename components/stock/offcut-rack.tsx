import Link from 'next/link';
import { StatusBadge, type Tone } from '@/components/ui/status-badge';
import type { OffcutRow } from '@/shared/wire/stock';
import { ScrapOffcutButton } from './scrap-offcut-button';

type Offcut = OffcutRow;
const TONE: Record<Offcut['status'], Tone> = { available: 'good', reserved: 'accent', used: 'neutral', scrapped: 'bad' };

/**
 * The offcut rack: one shelf per material and thickness, each offcut drawn to scale against the largest on its shelf,
 * so a glance says what is worth pulling first.
 */
export function OffcutRack({
  rack,
  len,
  thick,
  money,
  canScrap,
}: {
  rack: Offcut[];
  len: (mm: number) => string;
  thick: (mm: number) => string;
  money: ((cents: number) => string) | null;
  canScrap: boolean;
}) {
  const shelves = new Map<string, Offcut[]>();
  for (const o of rack) {
    const key = `${o.material} · ${thick(o.thickness)}`;
    shelves.set(key, [...(shelves.get(key) ?? []), o]);
  }
  return (
    <div className="space-y-5">
      {[...shelves.entries()].map(([shelf, pieces]) => {
        const longest = Math.max(...pieces.map((p) => p.length));
        return (
          <section key={shelf} aria-label={`Shelf ${shelf}`}>
            <h3 className="mb-2 text-sm font-semibold text-graphite-soft">
              {shelf} <span className="font-normal text-graphite-mute">({pieces.length})</span>
            </h3>
            <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
              {pieces.map((o) => {
                const label = `${o.material} offcut ${len(o.length)} × ${len(o.width)}`;
                return (
                  <li key={o.id} className="card flex gap-3 p-3" data-testid="offcut" data-status={o.status}>
                    <div className="flex h-16 w-28 shrink-0 items-center justify-start rounded bg-paper-deep p-1" aria-hidden>
                      <div
                        className={`rounded-sm border ${o.grain === 'none' ? 'border-graphite-faint bg-paper-edge' : 'border-oak bg-oak-light'}`}
                        style={{ width: Math.max(6, o.length * (104 / longest)), height: Math.max(4, Math.min(56, o.width * (104 / longest))) }}
                      />
                    </div>
                    <div className="min-w-0 flex-1 text-sm">
                      <div className="num whitespace-nowrap text-left font-medium">
                        {len(o.length)} × {len(o.width)}
                      </div>
                      <div className="text-xs text-graphite-mute">
                        {o.location || 'no location'}
                        {o.planName && (
                          <>
                            {' '}
                            · from {o.planName}
                            {o.sourcePiece ? `, piece ${o.sourcePiece}` : ''}
                          </>
                        )}
                        {money && o.costCents > 0 && <> · {money(o.costCents)}</>}
                      </div>
                      <div className="mt-1">
                        <StatusBadge tone={TONE[o.status]}>{o.status}</StatusBadge>
                      </div>
                    </div>
                    {canScrap && o.status === 'available' && (
                      <div className="self-start">
                        <ScrapOffcutButton id={o.id} label={label} />
                      </div>
                    )}
                  </li>
                );
              })}
            </ul>
          </section>
        );
      })}
      {rack.length > 0 && (
        <p className="text-xs text-graphite-mute">
          Reserved offcuts belong to released plans; <Link href="/shop-floor">the shop floor</Link> shows which.
        </p>
      )}
    </div>
  );
}
