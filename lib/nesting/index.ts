/** Kerfwise nesting: request in, plan out, and the one judge of any plan. Everything in mm. */
export { optimize, type OptimizeOptions, type OptimizeProgress } from '@/lib/nesting/optimize';
export { validatePlan, type Violation, type ViolationCode } from '@/lib/nesting/validate-plan';
export { rebuildCuts } from '@/lib/nesting/rebuild-cuts';
export { readPlan, PlanVersionError } from '@/lib/nesting/read-plan';
export { findGuillotineTree, countStages, STRIP_STAGES } from '@/lib/nesting/guillotine';
export { replaySawOrder } from '@/lib/nesting/saw-order';
export type {
  NestPart,
  NestRequest,
  NestRequestInput,
  NestSettings,
  NestStock,
  Placement,
  Plan,
  PlanInput,
  PlanPiece,
  SawPiece,
  SawStep,
  Unplaced,
} from '@/shared/schemas/nesting';
