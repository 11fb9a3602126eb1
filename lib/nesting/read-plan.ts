/** Reading a saved plan: migrated forward to the current version, never silently misread. */
import { nestRequestSchema, PLAN_VERSION, planSchema, type NestRequest, type Plan } from '@/shared/schemas/nesting';

export class PlanVersionError extends Error {
  constructor(readonly found: unknown) {
    super(
      typeof found === 'number' && found > PLAN_VERSION
        ? `this plan was saved by a newer Kerfwise (plan version ${found}; this one reads up to ${PLAN_VERSION})`
        : `this is not a Kerfwise plan of a known version (version: ${JSON.stringify(found)})`,
    );
    this.name = 'PlanVersionError';
  }
}

/**
 * Migrations from version n to n + 1, applied in turn. Version 1 is the first: none yet. When the plan's shape
 * changes, bump PLAN_VERSION and add the step from the previous version here.
 */
const MIGRATIONS: Record<number, (plan: Record<string, unknown>) => Record<string, unknown>> = {};

/** A saved plan (parsed JSON) as a current `Plan`; throws PlanVersionError or a ZodError when it cannot be read. */
export function readPlan(saved: unknown): Plan {
  if (typeof saved !== 'object' || saved === null) throw new PlanVersionError(undefined);
  let plan = saved as Record<string, unknown>;
  const version = plan.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1 || version > PLAN_VERSION) throw new PlanVersionError(version);
  for (let v = version; v < PLAN_VERSION; v++) plan = { ...MIGRATIONS[v](plan), version: v + 1 };
  return planSchema.parse(plan);
}

/**
 * A stored plan's two halves, read the one way everything reads them: the document through `readPlan` (migrated
 * forward, or an error: a plan is never misread), and the request it was nested from, or null when it no longer
 * parses — then every rule that needs it (the kerf, the minimum offcut, the parts' names) takes the shop's settings.
 */
export function readStoredPlan(stored: { document: unknown; request: unknown }): { document: Plan; request: NestRequest | null } {
  const request = nestRequestSchema.safeParse(stored.request);
  return { document: readPlan(stored.document), request: request.success ? request.data : null };
}
