import type { DetailChange, listMovements } from '@/db/queries/stock';
import { describeMovement } from '@/lib/stock/describe-movement';
import { describeDetailChanges } from './describe-detail-changes';

type Movement = Awaited<ReturnType<typeof listMovements>>[number];

/**
 * The stock ledger: every change of a count, who made it and when, newest first, with the on-hand and reserved
 * change of each row apart (a reservation moves only the reserved count; cutting reserved pieces moves both, in
 * one row); with it the changes to a size's details (cost, location…), which move no stock and so change no count.
 */
export function MovementHistory({
  movements,
  changes = [],
  money = null,
  timeZone = 'UTC',
}: {
  movements: Movement[];
  changes?: DetailChange[];
  money?: ((cents: number) => string) | null;
  timeZone?: string;
}) {
  const when = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short', timeZone });
  const rows: { at: Date; movement?: Movement; change?: DetailChange }[] = [
    ...movements.map((m) => ({ at: m.createdAt, movement: m })),
    ...changes.map((c) => ({ at: c.createdAt, change: c })),
  ].sort((a, b) => b.at.getTime() - a.at.getTime());
  return (
    <div className="card overflow-x-auto">
      <table className="data-table" aria-label="Stock history">
        <thead>
          <tr>
            <th>When</th>
            <th>What</th>
            <th>Stock</th>
            <th className="num">On hand</th>
            <th className="num">Reserved</th>
            <th>Who</th>
            <th>Reason</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ movement: m, change: c }) => {
            if (m) {
              const words = describeMovement(m);
              return (
                <tr key={m.id} data-testid="movement" data-kind={m.kind}>
                  <td className="whitespace-nowrap">{when.format(m.createdAt)}</td>
                  <td>
                    <span className="whitespace-nowrap">{words.what}</span>
                    {words.meaning && <span className="block min-w-48 max-w-72 text-xs text-graphite-mute">{words.meaning}</span>}
                  </td>
                  <td>{m.item ?? '—'}</td>
                  <td className="num" data-testid="movement-on-hand">
                    {words.onHand}
                  </td>
                  <td className="num" data-testid="movement-reserved">
                    {words.reserved}
                  </td>
                  <td>{m.who ?? 'Kerfwise'}</td>
                  <td className="text-graphite-soft">{m.reason}</td>
                </tr>
              );
            }
            return (
              c && (
                <tr key={c.id} data-testid="detail-change">
                  <td className="whitespace-nowrap">{when.format(c.createdAt)}</td>
                  <td>Details changed</td>
                  <td>{c.item ?? '—'}</td>
                  <td className="num text-graphite-mute">—</td>
                  <td className="num text-graphite-mute">—</td>
                  <td>{c.who ?? 'Kerfwise'}</td>
                  <td className="text-graphite-soft">{describeDetailChanges(c.changes, money)}</td>
                </tr>
              )
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
