import { deleteCustomer, getCustomer, updateCustomer } from '@/db/queries/customers';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { customerPatchSchema } from '@/shared/schemas/customer';

// GET /api/customers/:id – one customer with their jobs
export const GET = route({ permission: 'customers:read', params: idParams }, async ({ scope, params }) => {
  return (await getCustomer(scope, params.id)) ?? Promise.reject(notFound('That customer'));
});

// PATCH /api/customers/:id – change a customer's details (only the fields sent)
export const PATCH = route({ permission: 'customers:write', params: idParams, body: customerPatchSchema }, async ({ scope, params, body }) => {
  return (await updateCustomer(scope, params.id, body)) ?? Promise.reject(notFound('That customer'));
});

// DELETE /api/customers/:id – delete a customer no job belongs to (409 while jobs do)
export const DELETE = route({ permission: 'customers:write', params: idParams }, async ({ scope, params }) => {
  if (!(await deleteCustomer(scope, params.id))) throw notFound('That customer');
  return { ok: true };
});
