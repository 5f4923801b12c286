// GET /api/admin/accounts?q=&page=&pageSize= — admins only: search accounts by e-mail or name, paged.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { invalidInput, json } from '@server/http.ts';
import { accountListQuerySchema } from '@server/accounts/account.schema.ts';
import { searchAccounts } from '@server/accounts/account.repository.ts';
import { toAccountJson } from '@server/accounts/accountJson.ts';
import { requireRole } from '@server/auth/guards.ts';

export const GET = (async ({ locals, url }) => {
  const admin = requireRole(locals, 'admin');
  if (!admin.ok) return admin.error;
  const query = accountListQuerySchema.safeParse(Object.fromEntries(url.searchParams));
  if (!query.success) return invalidInput(query.error, 'Check the search parameters.');
  const { q, page, pageSize } = query.data;
  const result = await searchAccounts(db, q, page, pageSize);
  return json({ accounts: result.accounts.map(toAccountJson), total: result.total, page, pageSize });
}) satisfies APIRoute;
