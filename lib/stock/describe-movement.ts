/** The kinds of row in the stock ledger (db/schema/enums.ts `movement_kind`). */
export type MovementKind = 'received' | 'reserved' | 'released' | 'consumed' | 'offcut-created' | 'scrapped' | 'adjusted';

export interface MovementCounts {
  kind: MovementKind;
  /** Signed change of the on-hand count. */
  quantity: number;
  /** Signed change of the reserved count. */
  reservedChange: number;
}

export interface MovementWords {
  what: string;
  /** "+3", "−1", or "—" when the count did not move. */
  onHand: string;
  reserved: string;
  /** What the row means, as a sentence (for a tooltip or a screen reader). */
  meaning: string;
}

const signed = (n: number) => (n === 0 ? '—' : n > 0 ? `+${n}` : `−${Math.abs(n)}`);
const pieces = (n: number) => `${Math.abs(n)} piece${Math.abs(n) === 1 ? '' : 's'}`;

/**
 * One ledger row in words, saying which count moved: a reservation holds pieces that stay on the rack (reserved
 * changes, on hand does not); cutting reserved pieces takes them off the rack and ends their reservation in the
 * same row, so one sheet cut reads as one row, "Cut (was reserved)", on hand −1, reserved −1, free unchanged.
 */
export function describeMovement(m: MovementCounts): MovementWords {
  const counts = { onHand: signed(m.quantity), reserved: signed(m.reservedChange) };
  switch (m.kind) {
    case 'received':
      return { what: 'Received', ...counts, meaning: `${pieces(m.quantity)} added to the rack.` };
    case 'reserved':
      return { what: 'Reserved', ...counts, meaning: `${pieces(m.reservedChange)} set aside for a released plan; still on the rack.` };
    case 'released':
      return { what: 'Reservation given back', ...counts, meaning: `${pieces(m.reservedChange)} free again; nothing left the rack.` };
    case 'consumed':
      return m.reservedChange !== 0
        ? {
            what: 'Cut (was reserved)',
            ...counts,
            meaning: `${pieces(m.quantity)} cut for the plan that reserved ${Math.abs(m.quantity) === 1 ? 'it' : 'them'}: off the rack, and the reservation ends.`,
          }
        : { what: 'Cut', ...counts, meaning: `${pieces(m.quantity)} cut and taken off the rack.` };
    case 'offcut-created':
      return { what: 'Offcut racked', ...counts, meaning: 'An offcut put on the rack.' };
    case 'scrapped':
      return { what: 'Scrapped', ...counts, meaning: 'Taken off the rack as scrap.' };
    case 'adjusted':
      return { what: 'Count adjusted', ...counts, meaning: `A count on the rack changed the book count by ${signed(m.quantity)}.` };
  }
}
