import type { listMovements } from '@/db/queries/stock';

type Movement = Awaited<ReturnType<typeof listMovements>>[number];

const KIND_LABELS: Record<Movement['kind'], string> = {
  received: 'Received',
  reserved: 'Reserved',
  released: 'Released',
  consumed: 'Cut',
  'offcut-created': 'Offcut racked',
  scrapped: 'Scrapped',
  adjusted: 'Count adjusted',
};

/** The stock ledger: every change of a count, who made it and when, newest first. */
export function MovementHistory({ movements, timeZone = 'UTC' }: { movements: Movement[]; timeZone?: string }) {
  const when = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short', timeZone });
  return (
    <div className="card overflow-x-auto">
      <table className="data-table" aria-label="Stock history">
        <thead>
          <tr>
            <th>When</th>
            <th>What</th>
            <th>Stock</th>
            <th className="num">Change</th>
            <th>Who</th>
            <th>Reason</th>
          </tr>
        </thead>
        <tbody>
          {movements.map((m) => (
            <tr key={m.id} data-testid="movement" data-kind={m.kind}>
              <td className="whitespace-nowrap">{when.format(m.createdAt)}</td>
              <td>{KIND_LABELS[m.kind]}</td>
              <td>{m.item ?? '—'}</td>
              <td className="num">{m.quantity > 0 ? `+${m.quantity}` : m.quantity}</td>
              <td>{m.who ?? 'Kerfwise'}</td>
              <td className="text-graphite-soft">{m.reason}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
