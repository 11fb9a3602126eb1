/**
 * The `/api` contract, held on the server side: for every row of `shared/wire/api.ts`, the route module's handler
 * (its `RouteHandler<Result, Body, Query>` type from `route()`) must answer something the row's `response` accepts,
 * and its zod schemas must accept the row's `body` and `query`. Nothing runs here: `npx tsc --noEmit` compiles it,
 * and an error names the row that drifted. A new row of the table needs its line in `Handlers` below.
 */
import type { RouteBody, RouteQuery, RouteResult } from '@/server/api/route';
import type { ApiBody, ApiQuery, ApiResponse, ApiRoute } from '@/shared/wire/api';
import type * as jobs from '@/app/api/jobs/route';
import type * as jobsId from '@/app/api/jobs/[id]/route';
import type * as jobsIdParts from '@/app/api/jobs/[id]/parts/route';
import type * as jobsIdPartsPartId from '@/app/api/jobs/[id]/parts/[partId]/route';
import type * as jobsIdCutListPreview from '@/app/api/jobs/[id]/cut-list/preview/route';
import type * as jobsIdCutListImport from '@/app/api/jobs/[id]/cut-list/import/route';
import type * as jobsIdDrawerSchedules from '@/app/api/jobs/[id]/drawer-schedules/route';
import type * as jobsIdDrawerSchedulesScheduleId from '@/app/api/jobs/[id]/drawer-schedules/[scheduleId]/route';
import type * as jobsIdNestRequest from '@/app/api/jobs/[id]/nest-request/route';
import type * as jobsIdPlans from '@/app/api/jobs/[id]/plans/route';
import type * as jobsIdQuotes from '@/app/api/jobs/[id]/quotes/route';
import type * as jobsIdRecuts from '@/app/api/jobs/[id]/recuts/route';
import type * as customers from '@/app/api/customers/route';
import type * as customersId from '@/app/api/customers/[id]/route';
import type * as materials from '@/app/api/materials/route';
import type * as stock from '@/app/api/stock/route';
import type * as stockId from '@/app/api/stock/[id]/route';
import type * as stockIdReceive from '@/app/api/stock/[id]/receive/route';
import type * as stockIdAdjust from '@/app/api/stock/[id]/adjust/route';
import type * as stockImport from '@/app/api/stock/import/route';
import type * as offcuts from '@/app/api/offcuts/route';
import type * as offcutsIdScrap from '@/app/api/offcuts/[id]/scrap/route';
import type * as plansId from '@/app/api/plans/[id]/route';
import type * as plansIdSteps from '@/app/api/plans/[id]/steps/route';
import type * as plansIdRelease from '@/app/api/plans/[id]/release/route';
import type * as plansIdCancel from '@/app/api/plans/[id]/cancel/route';
import type * as plansIdDone from '@/app/api/plans/[id]/done/route';
import type * as recutsIdCancel from '@/app/api/recuts/[id]/cancel/route';
import type * as quotesId from '@/app/api/quotes/[id]/route';
import type * as quotesIdSend from '@/app/api/quotes/[id]/send/route';
import type * as quotesIdRevisions from '@/app/api/quotes/[id]/revisions/route';
import type * as qTokenAnswer from '@/app/api/q/[token]/answer/route';
import type * as qTokenCheckout from '@/app/api/q/[token]/checkout/route';
import type * as purchaseOrders from '@/app/api/purchase-orders/route';
import type * as purchaseOrdersId from '@/app/api/purchase-orders/[id]/route';
import type * as purchaseOrdersIdSend from '@/app/api/purchase-orders/[id]/send/route';
import type * as purchaseOrdersIdCancel from '@/app/api/purchase-orders/[id]/cancel/route';
import type * as purchaseOrdersIdReceive from '@/app/api/purchase-orders/[id]/receive/route';
import type * as settings from '@/app/api/settings/route';
import type * as settingsPricing from '@/app/api/settings/pricing/route';
import type * as settingsHardware from '@/app/api/settings/hardware/route';
import type * as settingsHardwareId from '@/app/api/settings/hardware/[id]/route';
import type * as settingsBuying from '@/app/api/settings/buying/route';
import type * as saws from '@/app/api/saws/route';
import type * as sawsId from '@/app/api/saws/[id]/route';
import type * as slideModels from '@/app/api/slide-models/route';
import type * as slideModelsId from '@/app/api/slide-models/[id]/route';
import type * as setupCards from '@/app/api/setup-cards/route';
import type * as setupCardsId from '@/app/api/setup-cards/[id]/route';
import type * as team from '@/app/api/team/route';
import type * as teamId from '@/app/api/team/[id]/route';
import type * as teamIdInvite from '@/app/api/team/[id]/invite/route';
import type * as outboxIdRetry from '@/app/api/outbox/[id]/retry/route';
import type * as passwordResets from '@/app/api/password-resets/route';
import type * as passwordResetsToken from '@/app/api/password-resets/[token]/route';
import type * as invitesToken from '@/app/api/invites/[token]/route';

/** Each row's handler: the method exported by the route file its path names. */
interface Handlers {
  'GET /api/jobs': typeof jobs.GET;
  'POST /api/jobs': typeof jobs.POST;
  'PATCH /api/jobs/:id': typeof jobsId.PATCH;
  'DELETE /api/jobs/:id': typeof jobsId.DELETE;
  'GET /api/jobs/:id/parts': typeof jobsIdParts.GET;
  'POST /api/jobs/:id/parts': typeof jobsIdParts.POST;
  'PATCH /api/jobs/:id/parts/:partId': typeof jobsIdPartsPartId.PATCH;
  'DELETE /api/jobs/:id/parts/:partId': typeof jobsIdPartsPartId.DELETE;
  'POST /api/jobs/:id/cut-list/preview': typeof jobsIdCutListPreview.POST;
  'POST /api/jobs/:id/cut-list/import': typeof jobsIdCutListImport.POST;
  'GET /api/jobs/:id/drawer-schedules': typeof jobsIdDrawerSchedules.GET;
  'POST /api/jobs/:id/drawer-schedules': typeof jobsIdDrawerSchedules.POST;
  'PUT /api/jobs/:id/drawer-schedules/:scheduleId': typeof jobsIdDrawerSchedulesScheduleId.PUT;
  'DELETE /api/jobs/:id/drawer-schedules/:scheduleId': typeof jobsIdDrawerSchedulesScheduleId.DELETE;
  'GET /api/jobs/:id/nest-request': typeof jobsIdNestRequest.GET;
  'GET /api/jobs/:id/plans': typeof jobsIdPlans.GET;
  'POST /api/jobs/:id/plans': typeof jobsIdPlans.POST;
  'POST /api/jobs/:id/quotes': typeof jobsIdQuotes.POST;
  'GET /api/jobs/:id/recuts': typeof jobsIdRecuts.GET;
  'GET /api/customers': typeof customers.GET;
  'POST /api/customers': typeof customers.POST;
  'PATCH /api/customers/:id': typeof customersId.PATCH;
  'GET /api/materials': typeof materials.GET;
  'POST /api/stock': typeof stock.POST;
  'PATCH /api/stock/:id': typeof stockId.PATCH;
  'POST /api/stock/:id/receive': typeof stockIdReceive.POST;
  'POST /api/stock/:id/adjust': typeof stockIdAdjust.POST;
  'POST /api/stock/import': typeof stockImport.POST;
  'POST /api/offcuts': typeof offcuts.POST;
  'POST /api/offcuts/:id/scrap': typeof offcutsIdScrap.POST;
  'GET /api/plans/:id': typeof plansId.GET;
  'PUT /api/plans/:id': typeof plansId.PUT;
  'GET /api/plans/:id/steps': typeof plansIdSteps.GET;
  'POST /api/plans/:id/steps': typeof plansIdSteps.POST;
  'DELETE /api/plans/:id/steps': typeof plansIdSteps.DELETE;
  'POST /api/plans/:id/release': typeof plansIdRelease.POST;
  'POST /api/plans/:id/cancel': typeof plansIdCancel.POST;
  'POST /api/plans/:id/done': typeof plansIdDone.POST;
  'POST /api/recuts/:id/cancel': typeof recutsIdCancel.POST;
  'PATCH /api/quotes/:id': typeof quotesId.PATCH;
  'POST /api/quotes/:id/send': typeof quotesIdSend.POST;
  'POST /api/quotes/:id/revisions': typeof quotesIdRevisions.POST;
  'POST /api/q/:token/answer': typeof qTokenAnswer.POST;
  'POST /api/q/:token/checkout': typeof qTokenCheckout.POST;
  'POST /api/purchase-orders': typeof purchaseOrders.POST;
  'PATCH /api/purchase-orders/:id': typeof purchaseOrdersId.PATCH;
  'POST /api/purchase-orders/:id/send': typeof purchaseOrdersIdSend.POST;
  'POST /api/purchase-orders/:id/cancel': typeof purchaseOrdersIdCancel.POST;
  'POST /api/purchase-orders/:id/receive': typeof purchaseOrdersIdReceive.POST;
  'GET /api/settings': typeof settings.GET;
  'PATCH /api/settings': typeof settings.PATCH;
  'GET /api/settings/pricing': typeof settingsPricing.GET;
  'PUT /api/settings/pricing': typeof settingsPricing.PUT;
  'GET /api/settings/hardware': typeof settingsHardware.GET;
  'POST /api/settings/hardware': typeof settingsHardware.POST;
  'PUT /api/settings/hardware/:id': typeof settingsHardwareId.PUT;
  'DELETE /api/settings/hardware/:id': typeof settingsHardwareId.DELETE;
  'PATCH /api/settings/buying': typeof settingsBuying.PATCH;
  'GET /api/saws': typeof saws.GET;
  'POST /api/saws': typeof saws.POST;
  'PUT /api/saws/:id': typeof sawsId.PUT;
  'DELETE /api/saws/:id': typeof sawsId.DELETE;
  'GET /api/slide-models': typeof slideModels.GET;
  'POST /api/slide-models': typeof slideModels.POST;
  'PUT /api/slide-models/:id': typeof slideModelsId.PUT;
  'DELETE /api/slide-models/:id': typeof slideModelsId.DELETE;
  'GET /api/setup-cards': typeof setupCards.GET;
  'POST /api/setup-cards': typeof setupCards.POST;
  'PUT /api/setup-cards/:id': typeof setupCardsId.PUT;
  'DELETE /api/setup-cards/:id': typeof setupCardsId.DELETE;
  'GET /api/team': typeof team.GET;
  'POST /api/team': typeof team.POST;
  'PATCH /api/team/:id': typeof teamId.PATCH;
  'POST /api/team/:id/invite': typeof teamIdInvite.POST;
  'POST /api/outbox/:id/retry': typeof outboxIdRetry.POST;
  'POST /api/password-resets': typeof passwordResets.POST;
  'POST /api/password-resets/:token': typeof passwordResetsToken.POST;
  'POST /api/invites/:token': typeof invitesToken.POST;
}

type Answers<K extends ApiRoute> = [RouteResult<Handlers[K]>] extends [ApiResponse<K>]
  ? true
  : { answers: RouteResult<Handlers[K]>; table: ApiResponse<K> };
type TakesBody<K extends ApiRoute> = [ApiBody<K>] extends [RouteBody<Handlers[K]>]
  ? true
  : { table: ApiBody<K>; schemaAccepts: RouteBody<Handlers[K]> };
type TakesQuery<K extends ApiRoute> =
  ApiQuery<K> extends undefined
    ? true
    : [ApiQuery<K>] extends [RouteQuery<Handlers[K]>]
      ? true
      : { table: ApiQuery<K>; schemaAccepts: RouteQuery<Handlers[K]> };

/**
 * Rows where the handler does not answer what the screen expects yet, each with why; the check asserts that they
 * still disagree, so fixing the handler makes tsc point here to take the row out.
 */
type KnownGaps = never;

type Holds<K extends ApiRoute> = K extends KnownGaps ? (Answers<K> extends true ? 'fixed: take it out of KnownGaps' : true) : Answers<K>;

/** The rows a check fails on (never, when all hold): tsc's message names them. */
type Failing<Checks extends Record<ApiRoute, unknown>> = { [K in ApiRoute]: Checks[K] extends true ? never : K }[ApiRoute];
type AnswersOtherwise = Failing<{ [K in ApiRoute]: Holds<K> }>;
type RefusesBody = Failing<{ [K in ApiRoute]: TakesBody<K> }>;
type RefusesQuery = Failing<{ [K in ApiRoute]: TakesQuery<K> }>;

// Every row has a handler, and every handler a row.
export const everyRowHasAHandler: Record<ApiRoute, true> = {} as Record<keyof Handlers, true>;
export const everyHandlerHasARow: Record<keyof Handlers, true> = {} as Record<ApiRoute, true>;

// Each fails naming the rows: "Type 'true' is not assignable to type '"failing: PATCH /api/settings"'".
export const answersWhatTheTableSays: [AnswersOtherwise] extends [never] ? true : `failing: ${AnswersOtherwise}` = true;
export const acceptsTheTablesBody: [RefusesBody] extends [never] ? true : `failing: ${RefusesBody}` = true;
export const acceptsTheTablesQuery: [RefusesQuery] extends [never] ? true : `failing: ${RefusesQuery}` = true;

/** Why a row fails, to read in an editor: `Why<'PATCH /api/settings'>`. */
export type Why<K extends ApiRoute> = { answers: Holds<K>; body: TakesBody<K>; query: TakesQuery<K> };
