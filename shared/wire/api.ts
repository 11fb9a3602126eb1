/**
 * The contract of `/api` with the screens: one row per JSON route a screen calls, keyed `'METHOD /api/path/:param'`,
 * with what it takes (`body`, `query`: what the route's zod schema accepts) and what it answers (`response`).
 * `client/api.ts` calls routes through it; `tests/house-rules/api-contract.ts` holds every route module to its row
 * (tsc fails when a handler answers something else, or its schema refuses the body the table promises), and
 * `tests/house-rules/api-contract.test.ts` checks each key names a route file that exports the method.
 * Path parameters come from the key itself (`:id` → `params: { id }`), named as the route's folders are.
 */
import type { z } from 'zod';
import type { Customer, customerInputSchema, customerPatchSchema } from '@/shared/schemas/customer';
import type { cutListImportSchema, cutListUploadSchema } from '@/shared/schemas/cut-list-upload';
import type { DrawerScheduleInput } from '@/shared/schemas/drawer-schedule';
import type { jobInputSchema, jobPatchSchema, JobStatus, JobSummary } from '@/shared/schemas/job';
import type { JobListPage, JobListQuery } from '@/shared/schemas/job-list';
import type { NestRequestInput } from '@/shared/schemas/nesting';
import type { Part, partInputSchema, partPatchSchema } from '@/shared/schemas/part';
import type { planCreateSchema, planUpdateSchema } from '@/shared/schemas/plan-save';
import type { HardwareItem, hardwareItemSchema, pricingSettingsSchema } from '@/shared/schemas/pricing';
import type {
  BuyingSettings,
  buyingSettingsPatchSchema,
  createPurchaseOrdersSchema,
  purchaseOrderPatchSchema,
  receivePurchaseOrderSchema,
  sendPurchaseOrderSchema,
} from '@/shared/schemas/purchase-order';
import type { newQuoteSchema, quoteRevisionPatchSchema } from '@/shared/schemas/quote';
import type { QuoteAnswerInput } from '@/shared/schemas/quote-answer';
import type { cancelRecutSchema, NestFor, RecutStatus, RecutView } from '@/shared/schemas/recut';
import type { SawInput } from '@/shared/schemas/saw';
import type { SetupCardInput } from '@/shared/schemas/setup-card';
import type { ShopSettings, shopSettingsPatchSchema } from '@/shared/schemas/shop';
import type { SlideModelInput } from '@/shared/schemas/slide-model';
import type {
  adjustStockSchema,
  finishPlanSchema,
  importStockSchema,
  receiveStockSchema,
  recordOffcutSchema,
  scrapOffcutSchema,
  stockItemPatchSchema,
  stockItemSchema,
} from '@/shared/schemas/stock';
import type { TeamMember, teamMemberInputSchema, teamMemberPatchSchema } from '@/shared/schemas/user';
import type { PurchaseOrdersMade, PurchaseOrderView } from './buying';
import type { CutListImported, CutListPreview, ListedPart, SavedDrawerSchedule } from './jobs';
import type { FinishResult, JobPlanSummary, PlanCancelled, PlanDetail, PlanSaved, PlanTicks, PlanUpdated, ReleaseResult, StepRef } from './plans';
import type { QuoteAnswered, QuoteRevisionView } from './quotes';
import type { PricingView, SavedSaw, SavedSetupCard, SavedSlideModel } from './settings';
import type { OffcutRecord, StockImportResult, StockItemRecord, StockOffer } from './stock';

/** The answer of a route that reports only that it did it. */
export interface Done {
  ok: boolean;
}

/** A re-cut taken off its job's list. */
export interface RecutCancelled {
  id: string;
  status: RecutStatus;
  jobStatus: JobStatus | null;
}

/** What a link-choosing-a-password route answers: the account it set, to sign in with. */
export interface PasswordChosen {
  email: string;
}

type In<S extends z.ZodType> = z.input<S>;

/** The table. A row: `body?` (what the schema accepts), `query?`, `response` (what the handler resolves to). */
export interface ApiRoutes {
  'GET /api/jobs': { query: Partial<JobListQuery>; response: JobListPage };
  'POST /api/jobs': { body: In<typeof jobInputSchema>; response: JobSummary };
  'PATCH /api/jobs/:id': { body: In<typeof jobPatchSchema>; response: JobSummary };
  'DELETE /api/jobs/:id': { response: Done };
  'GET /api/jobs/:id/parts': { response: ListedPart[] };
  'POST /api/jobs/:id/parts': { body: In<typeof partInputSchema>; response: Part };
  'PATCH /api/jobs/:id/parts/:partId': { body: In<typeof partPatchSchema>; response: Part };
  'DELETE /api/jobs/:id/parts/:partId': { response: Done };
  'POST /api/jobs/:id/cut-list/preview': { body: In<typeof cutListUploadSchema>; response: CutListPreview };
  'POST /api/jobs/:id/cut-list/import': { body: In<typeof cutListImportSchema>; response: CutListImported };
  'GET /api/jobs/:id/drawer-schedules': { response: SavedDrawerSchedule[] };
  'POST /api/jobs/:id/drawer-schedules': { body: DrawerScheduleInput; response: SavedDrawerSchedule };
  'PUT /api/jobs/:id/drawer-schedules/:scheduleId': { body: DrawerScheduleInput; response: SavedDrawerSchedule };
  'DELETE /api/jobs/:id/drawer-schedules/:scheduleId': { response: Done };
  'GET /api/jobs/:id/nest-request': { query: { for?: NestFor }; response: NestRequestInput };
  'GET /api/jobs/:id/plans': { response: JobPlanSummary[] };
  'POST /api/jobs/:id/plans': { body: In<typeof planCreateSchema>; response: PlanSaved };
  'POST /api/jobs/:id/quotes': { body: In<typeof newQuoteSchema>; response: QuoteRevisionView };
  'GET /api/jobs/:id/recuts': { response: RecutView[] };

  'GET /api/customers': { query: { q?: string }; response: Customer[] };
  'POST /api/customers': { body: In<typeof customerInputSchema>; response: Customer };
  'PATCH /api/customers/:id': { body: In<typeof customerPatchSchema>; response: Customer };

  'GET /api/materials': { response: StockOffer[] };
  'POST /api/stock': { body: In<typeof stockItemSchema>; response: StockItemRecord };
  'PATCH /api/stock/:id': { body: In<typeof stockItemPatchSchema>; response: StockItemRecord };
  'POST /api/stock/:id/receive': { body: In<typeof receiveStockSchema>; response: StockItemRecord };
  'POST /api/stock/:id/adjust': { body: In<typeof adjustStockSchema>; response: StockItemRecord };
  'POST /api/stock/import': { body: In<typeof importStockSchema>; response: StockImportResult };
  'POST /api/offcuts': { body: In<typeof recordOffcutSchema>; response: OffcutRecord };
  'POST /api/offcuts/:id/scrap': { body: In<typeof scrapOffcutSchema>; response: OffcutRecord };

  'GET /api/plans/:id': { response: PlanDetail };
  'PUT /api/plans/:id': { body: In<typeof planUpdateSchema>; response: PlanUpdated };
  'GET /api/plans/:id/steps': { response: PlanTicks };
  'POST /api/plans/:id/steps': { body: StepRef; response: PlanTicks };
  'DELETE /api/plans/:id/steps': { body: StepRef; response: PlanTicks };
  'POST /api/plans/:id/release': { response: ReleaseResult };
  'POST /api/plans/:id/cancel': { response: PlanCancelled };
  'POST /api/plans/:id/done': { body: In<typeof finishPlanSchema>; response: FinishResult };
  'POST /api/recuts/:id/cancel': { body: In<typeof cancelRecutSchema>; response: RecutCancelled };

  'PATCH /api/quotes/:id': { body: In<typeof quoteRevisionPatchSchema>; response: QuoteRevisionView };
  'POST /api/quotes/:id/send': { response: QuoteRevisionView };
  'POST /api/quotes/:id/revisions': { response: QuoteRevisionView };
  'POST /api/q/:token/answer': { body: QuoteAnswerInput; response: QuoteAnswered };
  'POST /api/q/:token/checkout': { response: { url: string } };

  'POST /api/purchase-orders': { body: In<typeof createPurchaseOrdersSchema>; response: PurchaseOrdersMade };
  'PATCH /api/purchase-orders/:id': { body: In<typeof purchaseOrderPatchSchema>; response: PurchaseOrderView };
  'POST /api/purchase-orders/:id/send': { body: In<typeof sendPurchaseOrderSchema>; response: PurchaseOrderView };
  'POST /api/purchase-orders/:id/cancel': { response: PurchaseOrderView };
  'POST /api/purchase-orders/:id/receive': { body: In<typeof receivePurchaseOrderSchema>; response: PurchaseOrderView };

  'GET /api/settings': { response: ShopSettings };
  'PATCH /api/settings': { body: In<typeof shopSettingsPatchSchema>; response: ShopSettings };
  'GET /api/settings/pricing': { response: PricingView };
  'PUT /api/settings/pricing': { body: In<typeof pricingSettingsSchema>; response: PricingView };
  'GET /api/settings/hardware': { response: HardwareItem[] };
  'POST /api/settings/hardware': { body: In<typeof hardwareItemSchema>; response: HardwareItem };
  'PUT /api/settings/hardware/:id': { body: In<typeof hardwareItemSchema>; response: HardwareItem };
  'DELETE /api/settings/hardware/:id': { response: Done };
  'PATCH /api/settings/buying': { body: In<typeof buyingSettingsPatchSchema>; response: BuyingSettings };
  'GET /api/saws': { response: SavedSaw[] };
  'POST /api/saws': { body: SawInput; response: SavedSaw };
  'PUT /api/saws/:id': { body: SawInput; response: SavedSaw };
  'DELETE /api/saws/:id': { response: Done };
  'GET /api/slide-models': { response: SavedSlideModel[] };
  'POST /api/slide-models': { body: SlideModelInput; response: SavedSlideModel };
  'PUT /api/slide-models/:id': { body: SlideModelInput; response: SavedSlideModel };
  'DELETE /api/slide-models/:id': { response: Done };
  'GET /api/setup-cards': { response: SavedSetupCard[] };
  'POST /api/setup-cards': { body: SetupCardInput; response: SavedSetupCard };
  'PUT /api/setup-cards/:id': { body: SetupCardInput; response: SavedSetupCard };
  'DELETE /api/setup-cards/:id': { response: Done };

  'GET /api/team': { response: TeamMember[] };
  'POST /api/team': { body: In<typeof teamMemberInputSchema>; response: TeamMember };
  'PATCH /api/team/:id': { body: In<typeof teamMemberPatchSchema>; response: TeamMember };
  'POST /api/team/:id/invite': { response: TeamMember };
  'POST /api/outbox/:id/retry': { response: Done };

  'POST /api/password-resets': { body: { email: string }; response: Done & { message: string } };
  'POST /api/password-resets/:token': { body: { password: string }; response: PasswordChosen };
  'POST /api/invites/:token': { body: { password: string }; response: PasswordChosen };
}

export type ApiRoute = keyof ApiRoutes;

/** Every key of the table at run time (the contract test reads it); `satisfies` keeps it equal to the table. */
export const API_ROUTES = Object.keys({
  'GET /api/jobs': 1,
  'POST /api/jobs': 1,
  'PATCH /api/jobs/:id': 1,
  'DELETE /api/jobs/:id': 1,
  'GET /api/jobs/:id/parts': 1,
  'POST /api/jobs/:id/parts': 1,
  'PATCH /api/jobs/:id/parts/:partId': 1,
  'DELETE /api/jobs/:id/parts/:partId': 1,
  'POST /api/jobs/:id/cut-list/preview': 1,
  'POST /api/jobs/:id/cut-list/import': 1,
  'GET /api/jobs/:id/drawer-schedules': 1,
  'POST /api/jobs/:id/drawer-schedules': 1,
  'PUT /api/jobs/:id/drawer-schedules/:scheduleId': 1,
  'DELETE /api/jobs/:id/drawer-schedules/:scheduleId': 1,
  'GET /api/jobs/:id/nest-request': 1,
  'GET /api/jobs/:id/plans': 1,
  'POST /api/jobs/:id/plans': 1,
  'POST /api/jobs/:id/quotes': 1,
  'GET /api/jobs/:id/recuts': 1,
  'GET /api/customers': 1,
  'POST /api/customers': 1,
  'PATCH /api/customers/:id': 1,
  'GET /api/materials': 1,
  'POST /api/stock': 1,
  'PATCH /api/stock/:id': 1,
  'POST /api/stock/:id/receive': 1,
  'POST /api/stock/:id/adjust': 1,
  'POST /api/stock/import': 1,
  'POST /api/offcuts': 1,
  'POST /api/offcuts/:id/scrap': 1,
  'GET /api/plans/:id': 1,
  'PUT /api/plans/:id': 1,
  'GET /api/plans/:id/steps': 1,
  'POST /api/plans/:id/steps': 1,
  'DELETE /api/plans/:id/steps': 1,
  'POST /api/plans/:id/release': 1,
  'POST /api/plans/:id/cancel': 1,
  'POST /api/plans/:id/done': 1,
  'POST /api/recuts/:id/cancel': 1,
  'PATCH /api/quotes/:id': 1,
  'POST /api/quotes/:id/send': 1,
  'POST /api/quotes/:id/revisions': 1,
  'POST /api/q/:token/answer': 1,
  'POST /api/q/:token/checkout': 1,
  'POST /api/purchase-orders': 1,
  'PATCH /api/purchase-orders/:id': 1,
  'POST /api/purchase-orders/:id/send': 1,
  'POST /api/purchase-orders/:id/cancel': 1,
  'POST /api/purchase-orders/:id/receive': 1,
  'GET /api/settings': 1,
  'PATCH /api/settings': 1,
  'GET /api/settings/pricing': 1,
  'PUT /api/settings/pricing': 1,
  'GET /api/settings/hardware': 1,
  'POST /api/settings/hardware': 1,
  'PUT /api/settings/hardware/:id': 1,
  'DELETE /api/settings/hardware/:id': 1,
  'PATCH /api/settings/buying': 1,
  'GET /api/saws': 1,
  'POST /api/saws': 1,
  'PUT /api/saws/:id': 1,
  'DELETE /api/saws/:id': 1,
  'GET /api/slide-models': 1,
  'POST /api/slide-models': 1,
  'PUT /api/slide-models/:id': 1,
  'DELETE /api/slide-models/:id': 1,
  'GET /api/setup-cards': 1,
  'POST /api/setup-cards': 1,
  'PUT /api/setup-cards/:id': 1,
  'DELETE /api/setup-cards/:id': 1,
  'GET /api/team': 1,
  'POST /api/team': 1,
  'PATCH /api/team/:id': 1,
  'POST /api/team/:id/invite': 1,
  'POST /api/outbox/:id/retry': 1,
  'POST /api/password-resets': 1,
  'POST /api/password-resets/:token': 1,
  'POST /api/invites/:token': 1,
} satisfies Record<ApiRoute, 1>) as ApiRoute[];

/** `'PATCH /api/jobs/:id/parts/:partId'` → `{ id: string; partId: string }`. */
export type PathParams<K extends string> = K extends `${string}:${infer Name}/${infer Rest}`
  ? { [P in Name]: string } & PathParams<`/${Rest}`>
  : K extends `${string}:${infer Name}`
    ? { [P in Name]: string }
    : unknown;

export type ApiBody<K extends ApiRoute> = ApiRoutes[K] extends { body: infer B } ? B : undefined;
export type ApiQuery<K extends ApiRoute> = ApiRoutes[K] extends { query: infer Q } ? Q : undefined;
export type ApiResponse<K extends ApiRoute> = ApiRoutes[K]['response'];

/** What a value turns into through JSON: dates become ISO strings, everything else stays as it is. */
export type Jsonified<T> = T extends Date
  ? string
  : T extends readonly (infer E)[]
    ? Jsonified<E>[]
    : T extends object
      ? { [P in keyof T]: Jsonified<T[P]> }
      : T;
