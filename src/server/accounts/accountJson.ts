import type { Account } from './account.repository.ts';

/** How an account appears in API responses (never the password hash). */
export interface AccountJson {
  id: string;
  email: string;
  displayName: string;
  role: Account['role'];
  units: Account['units'];
  createdAt: string;
}

export function toAccountJson(a: Pick<Account, 'id' | 'email' | 'displayName' | 'role' | 'units' | 'createdAt'>): AccountJson {
  return { id: a.id, email: a.email, displayName: a.displayName, role: a.role, units: a.units, createdAt: a.createdAt.toISOString() };
}
