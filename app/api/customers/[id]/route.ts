import { deleteCustomer, getCustomer, updateCustomer } from '@/db/queries/customers';
import { idParams, route } from '@/server/api/route';
import { customerPatchSchema } from '@/shared/schemas/customer';

// GET /api/customers/:id – one customer with their jobs
export const GET = route({ permission: 'customers:read', params: idParams }, async ({ scope, params }) => {
  return getCustomer(scope, params.id);
});

// PATCH /api/customers/:id – change a customer's details (only the fields sent)
export const PATCH = route({ permission: 'customers:write', params: idParams, body: customerPatchSchema }, async ({ scope, params, body }) => {
  return updateCustomer(scope, params.id, body);
});

// DELETE /api/customers/:id – delete a customer no job belongs to (409 while jobs do)
export const DELETE = route({ permission: 'customers:write', params: idParams }, async ({ scope, params }) => {
  await deleteCustomer(scope, params.id);
  return { ok: true };
});
