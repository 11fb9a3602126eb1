import { z } from 'zod';
import { createCustomer, listCustomers } from '@/db/queries/customers';
import { route } from '@/server/api/route';
import { customerInputSchema } from '@/shared/schemas/customer';

// GET /api/customers – the shop's customers by name; ?q= searches name, company, e-mail and phone
export const GET = route({ permission: 'customers:read', query: z.object({ q: z.string().max(120).default('') }) }, async ({ scope, query }) =>
  listCustomers(scope, query.q),
);

// POST /api/customers – add a customer
export const POST = route({ permission: 'customers:write', body: customerInputSchema, status: 201 }, async ({ scope, body }) =>
  createCustomer(scope, body),
);
