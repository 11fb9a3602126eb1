import { planSchema, type NestRequest, type Plan } from '@/shared/schemas/nesting';
import { validatePlan, type Violation } from './validate-plan';

/**
 * Judges a plan against its request with `validatePlan` (the same rules the layout bench and the benchmark use):
 * the plan, parsed, or every rule it breaks.
 */
export function judgePlan(request: NestRequest, plan: unknown): { ok: true; plan: Plan } | { ok: false; violations: Violation[] } {
  const violations = validatePlan(request, plan);
  return violations.length ? { ok: false, violations } : { ok: true, plan: planSchema.parse(plan) };
}
