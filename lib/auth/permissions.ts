/** Everything a person can be allowed to do in Kerfwise. Route handlers name exactly one of these. */
export const PERMISSIONS = [
  'jobs:read',
  'jobs:write',
  'cutlist:write',
  'nest:run',
  'plans:read',
  'plans:write',
  'plans:release',
  /** Mark a plan done: consumes its stock and puts its offcuts on the rack. */
  'plans:finish',
  'sawsteps:tick',
  'stock:read',
  'stock:write',
  'offcuts:record',
  /** Read a job's re-cut list (damaged parts are recorded when finishing a plan: `plans:finish`). */
  'recuts:read',
  /** Take a re-cut off the list with a reason. */
  'recuts:cancel',
  'prices:read',
  /** The shop's customers: contact details, their jobs and quotes (never the cutter's). */
  'customers:read',
  'customers:write',
  /** Build, edit and send quotes; read cost, margin and hours. */
  'quotes:read',
  'quotes:write',
  'yield:read',
  /** Purchase orders: read them (with their prices), make, edit, send and cancel them. Receiving is `stock:write`. */
  'purchasing:read',
  'purchasing:write',
  'team:manage',
  /** The outbox (what mail went out, what failed, try again) and, in the demo, the Sent mail page. */
  'mail:manage',
  'settings:read',
  'settings:write',
] as const;

export type Permission = (typeof PERMISSIONS)[number];

export const ROLES = ['owner', 'estimator', 'cutter'] as const;
export type Role = (typeof ROLES)[number];

/** PRODUCT.md "Users and roles": the owner may do everything; the cutter never sees prices. */
export const ROLE_PERMISSIONS: Record<Role, readonly Permission[]> = {
  owner: PERMISSIONS,
  estimator: [
    'jobs:read',
    'jobs:write',
    'cutlist:write',
    'nest:run',
    'plans:read',
    'plans:write',
    'plans:release',
    'stock:read',
    'recuts:read',
    'recuts:cancel',
    'prices:read',
    'customers:read',
    'customers:write',
    'quotes:read',
    'quotes:write',
    'purchasing:read',
    'purchasing:write',
    'settings:read',
  ],
  cutter: ['jobs:read', 'plans:read', 'plans:finish', 'sawsteps:tick', 'stock:read', 'offcuts:record', 'recuts:read', 'settings:read'],
};

export function can(role: Role, permission: Permission): boolean {
  return ROLE_PERMISSIONS[role].includes(permission);
}

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  estimator: 'Estimator',
  cutter: 'Cutter',
};
