import type { AuthzRow } from './types';

// The owner's reports: the yield and offcut figures are the owner's (estimators see only the quoting reports, cutters none).
// Another shop's owner gets their own shop's report: 200, with none of this shop's rows (reports.test.ts checks).
const ownerOnly = { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 200 };

export const rows: AuthzRow[] = [
  { route: '/api/reports/yield', method: 'GET', expect: ownerOnly },
  { route: '/api/reports/offcut-use', method: 'GET', expect: ownerOnly },
  { route: '/api/reports/stock-value', method: 'GET', expect: ownerOnly },
  // Quoting is the estimator's work too.
  { route: '/api/reports/quoting', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 200 } },
];
