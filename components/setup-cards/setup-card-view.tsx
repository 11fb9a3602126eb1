import { formatLength } from '@/lib/units/format-length';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { ROUTER_TABLE_CAUTIONS } from '@/lib/joinery/router-safety';
import { JOINT_NAMES } from '@/lib/joinery/joint-rules';
import type { SetupCard, SetupCardField } from '@/shared/schemas/setup-card';
import type { ShopUnits } from '@/shared/schemas/units';

export const fieldValueText = (f: SetupCardField, units: ShopUnits) =>
  f.unit === 'mm' ? formatLength(f.value, units) : f.unit === 'rpm' ? `${f.value.toLocaleString('en-US')} rpm` : `${f.value}°`;

/** One setup card's settings, read-only. */
export function SetupCardView({ card, units, source }: { card: SetupCard; units: ShopUnits; source: 'saved' | 'default' | 'missing' }) {
  return (
    <div className="rounded-md border border-paper-edge bg-paper p-3 text-sm">
      <p className="font-medium">
        {JOINT_NAMES[card.joint]} in {exactLengthText(card.stockThickness, units)} stock{' '}
        <span className="text-xs font-normal text-graphite-mute">
          {source === 'saved' ? '· the shop’s card' : source === 'default' ? '· starting values (not saved yet)' : '· no card saved yet'}
        </span>
      </p>
      {card.fields.length > 0 && (
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-4">
          {card.fields.map((f) => (
            <div key={f.key} className="contents">
              <dt className="text-graphite-mute">{f.label}</dt>
              <dd className="num text-left">{fieldValueText(f, units)}</dd>
            </div>
          ))}
        </dl>
      )}
      {card.note && <p className="mt-1 text-graphite-soft">{card.note}</p>}
    </div>
  );
}

/** The router-table cautions every setup card shows; the machine's manual and local rules come first. */
export function RouterCautions() {
  return (
    <aside aria-label="Router table cautions" className="rounded-md border border-amber/40 bg-amber-wash/60 p-3 text-sm">
      <p className="mb-1 font-semibold text-amber">Router table cautions</p>
      <ul className="list-disc space-y-0.5 pl-5 text-graphite-soft">
        {ROUTER_TABLE_CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
