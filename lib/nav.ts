import { can, type Permission, type Role } from '@/lib/auth/permissions';

export interface NavItem {
  href: string;
  label: string;
  permission: Permission;
  hint: string;
}

/** The app's sections; each shows only to roles holding its permission. */
export const NAV_ITEMS: readonly NavItem[] = [
  { href: '/jobs', label: 'Jobs', permission: 'jobs:read', hint: 'Cut lists, drawer schedules, plans' },
  { href: '/customers', label: 'Customers', permission: 'customers:read', hint: 'People and firms, their jobs and quotes' },
  { href: '/setup-cards', label: 'Setup cards', permission: 'jobs:read', hint: 'Router settings per joint and thickness' },
  { href: '/stock', label: 'Stock room', permission: 'stock:read', hint: 'Sheets, boards and offcuts' },
  { href: '/purchase-orders', label: 'Purchase orders', permission: 'purchasing:read', hint: 'What the shop orders from its suppliers' },
  { href: '/yield', label: 'Yield ledger', permission: 'yield:read', hint: 'What the stock became' },
  // The estimator sees the quoting report only; the owner every report (the page decides per section).
  { href: '/reports', label: 'Reports', permission: 'quotes:read', hint: 'Yield, the rack and quotes over time' },
  { href: '/shop-floor', label: 'Shop floor', permission: 'sawsteps:tick', hint: 'Saw orders to cut' },
  { href: '/team', label: 'Team', permission: 'team:manage', hint: 'People and roles' },
  { href: '/outbox', label: 'Outbox', permission: 'mail:manage', hint: 'Mail sent and failed' },
  { href: '/settings', label: 'Shop settings', permission: 'settings:write', hint: 'Units, kerf, trim' },
];

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => can(role, item.permission));
}

/** Where a role lands after signing in. */
export function homeFor(role: Role): string {
  return role === 'cutter' ? '/shop-floor' : '/jobs';
}

export interface JobSection {
  /** Path under /jobs/<id> ('' is the cut list). */
  path: '' | '/drawers' | '/plan' | '/takeoff' | '/quotes';
  label: string;
  /** What the section's page requires (requirePageUser / jobSection in app/(app)/jobs/[id]). */
  permission: Permission;
}

/** A job's sections, each its own route; a role sees a link only to the sections it may open. */
export const JOB_SECTIONS: readonly JobSection[] = [
  { path: '', label: 'Cut list', permission: 'jobs:read' },
  { path: '/drawers', label: 'Drawer schedules', permission: 'jobs:read' },
  { path: '/plan', label: 'Plan', permission: 'plans:read' },
  { path: '/takeoff', label: 'Takeoff', permission: 'prices:read' },
  { path: '/quotes', label: 'Quotes', permission: 'quotes:read' },
];

export function jobSectionsFor(role: Role): JobSection[] {
  return JOB_SECTIONS.filter((s) => can(role, s.permission));
}
