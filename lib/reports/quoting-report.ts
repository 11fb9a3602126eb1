/** The quoting report's CSV, from `db/queries/quoting-report` rows: one line per period. */
import Papa from 'papaparse';
import { FORMULA_START } from '@/lib/cut-list/export-csv';
import { currencyDigits } from '@/lib/costing/money';

export interface QuotingFigures {
  period: string;
  sent: number;
  accepted: number;
  declined: number;
  expired: number;
  wonMinor: number;
  depositsMinor: number;
}

/** Accepted as a share of the quotes answered or run out in the period (0–1); null when none was. */
export const winRate = (p: QuotingFigures) => {
  const closed = p.accepted + p.declined + p.expired;
  return closed > 0 ? p.accepted / closed : null;
};

export function quotingCsv(rows: readonly QuotingFigures[], currency: string): string {
  const digits = currencyDigits(currency);
  const money = (minor: number) => (minor / 10 ** digits).toFixed(digits);
  const fields = ['Period from', 'Sent', 'Accepted', 'Declined', 'Expired', 'Won (%)', `Value won (${currency})`, `Deposits collected (${currency})`];
  const data = rows.map((r) => {
    const rate = winRate(r);
    return [
      r.period,
      String(r.sent),
      String(r.accepted),
      String(r.declined),
      String(r.expired),
      rate === null ? '' : (rate * 100).toFixed(1),
      money(r.wonMinor),
      money(r.depositsMinor),
    ];
  });
  return Papa.unparse({ fields, data }, { escapeFormulae: FORMULA_START, newline: '\r\n' });
}
