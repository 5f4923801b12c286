import type { ColumnType, Generated, Insertable, Selectable, Updateable } from 'kysely';

/** Database tables (snake_case, singular). Repositories map rows to camelCase domain objects. */
export interface Database {
  account: AccountTable;
  session: SessionTable;
  password_reset: PasswordResetTable;
  email_message: EmailMessageTable;
  rate_limit: RateLimitTable;
}

export type Role = 'quilter' | 'teacher' | 'admin';
export type UnitsPreference = 'in' | 'cm';

type CreatedAt = ColumnType<Date, Date | string | undefined, never>;
type UpdatedAt = ColumnType<Date, Date | string | undefined, Date | string>;

export interface AccountTable {
  id: Generated<string>;
  email: string;
  display_name: string;
  password_hash: string;
  role: ColumnType<Role, Role | undefined, Role>;
  units: ColumnType<UnitsPreference, UnitsPreference | undefined, UnitsPreference>;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}
export type AccountRow = Selectable<AccountTable>;
export type NewAccountRow = Insertable<AccountTable>;
export type AccountUpdate = Updateable<AccountTable>;

export interface SessionTable {
  id: string;
  account_id: string;
  expires_at: ColumnType<Date, Date, Date>;
  created_at: CreatedAt;
}
export type SessionRow = Selectable<SessionTable>;

export interface PasswordResetTable {
  id: string;
  account_id: string;
  expires_at: ColumnType<Date, Date, Date>;
  used_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  created_at: CreatedAt;
}

export interface EmailMessageTable {
  // bigserial comes back from pg as a string
  id: Generated<string>;
  to_address: string;
  subject: string;
  body_text: string;
  body_html: string | null;
  kind: string;
  dedupe_key: string | null;
  status: ColumnType<'pending' | 'sent' | 'failed', 'pending' | 'sent' | 'failed' | undefined, 'pending' | 'sent' | 'failed'>;
  attempts: Generated<number>;
  last_error: string | null;
  created_at: CreatedAt;
  sent_at: Date | null;
}

export interface RateLimitTable {
  key: string;
  hits: number;
  window_ends_at: Date;
}
