import type { ColumnType, Generated, Insertable, Selectable, Updateable } from 'kysely';

/** Database tables (snake_case, singular). Repositories map rows to camelCase domain objects. */
export interface Database {
  account: AccountTable;
  session: SessionTable;
  password_reset: PasswordResetTable;
  email_message: EmailMessageTable;
  rate_limit: RateLimitTable;
  sign_up_request: SignUpRequestTable;
  template: TemplateTable;
  template_version: TemplateVersionTable;
  class: ClassTable;
  lesson: LessonTable;
  enrollment: EnrollmentTable;
  class_invitation: ClassInvitationTable;
  lesson_progress: LessonProgressTable;
  lesson_photo: LessonPhotoTable;
  server_secret: ServerSecretTable;
  design: DesignTable;
  design_version: DesignVersionTable;
  design_route: DesignRouteTable;
  quilt: QuiltTable;
  corner_cost: CornerCostTable;
  quilt_plan_job: QuiltPlanJobTable;
  class_payment: ClassPaymentTable;
  payment_event: PaymentEventTable;
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
  /** Earliest start of the next attempt (progressive slow-down); null when there is no wait (migration 2026_12_04_1710). */
  next_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
}

/** A sign-up waiting for its e-mailed link (migration 2026_12_04_1710); the account is created when it is used. */
export interface SignUpRequestTable {
  id: string;
  email: string;
  display_name: string;
  password_hash: string;
  units: UnitsPreference;
  expires_at: ColumnType<Date, Date, Date>;
  created_at: CreatedAt;
}

// ── Teaching (migration 2026_12_02_1600_create_teaching) ──

export type TemplateVisibility = 'public' | 'class' | 'unlisted';
export type Difficulty = 'beginner' | 'intermediate' | 'advanced';

export interface TemplateTable {
  id: Generated<string>;
  owner_id: string;
  link_token: string;
  visibility: TemplateVisibility;
  latest_version: ColumnType<number, number | undefined, number>;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}

/** Immutable once inserted (a database trigger refuses UPDATE). jsonb columns are parsed with zod when read. */
export interface TemplateVersionTable {
  id: Generated<string>;
  template_id: string;
  version: number;
  title: string;
  description: string;
  difficulty: Difficulty;
  motifs: string[];
  units: UnitsPreference;
  width: number;
  height: number;
  design: ColumnType<unknown, string, never>;
  route: ColumnType<unknown, string, never>;
  figures: ColumnType<unknown, string, never>;
  source_design_id: string | null;
  published_at: CreatedAt;
}

export interface ClassTable {
  id: Generated<string>;
  teacher_id: string;
  title: string;
  description: string;
  /** A calendar date. pg reads `date` as a local-midnight Date: select it with to_char(…, 'YYYY-MM-DD'). */
  starts_on: ColumnType<Date, string, string>;
  price_cents: number | null;
  currency: string | null;
  join_code: string;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}

export interface LessonTable {
  id: Generated<string>;
  class_id: string;
  title: string;
  release_at: ColumnType<Date, Date, Date>;
  notes_md: string;
  template_version_id: string;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}

export interface EnrollmentTable {
  class_id: string;
  student_id: string;
  joined_via: 'invitation' | 'join-code' | 'payment';
  joined_at: CreatedAt;
  /** Set when the student's payment was refunded: lessons released after this instant are closed to them. */
  access_until: ColumnType<Date | null, Date | null | undefined, Date | null>;
}

export interface ClassInvitationTable {
  id: Generated<string>;
  class_id: string;
  email: string;
  token_hash: string;
  expires_at: ColumnType<Date, Date, Date>;
  used_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  used_by: ColumnType<string | null, string | null | undefined, string | null>;
  revoked_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  created_at: CreatedAt;
}

export interface LessonProgressTable {
  lesson_id: string;
  student_id: string;
  step_index: number;
  total_steps: number;
  finished_at: Date | null;
  last_active_at: ColumnType<Date, Date | undefined, Date>;
  /** When the student made the saved move, by the device's clock; older saves are ignored (re-sent offline queue). */
  client_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
}

export interface LessonPhotoTable {
  id: string;
  lesson_id: string;
  student_id: string;
  side: 'front' | 'back';
  object_key: string;
  thumb_key: string;
  width: number;
  height: number;
  bytes: number;
  created_at: CreatedAt;
}

export interface ServerSecretTable {
  name: string;
  value: string;
  created_at: CreatedAt;
}

// Designs (src/server/designs/). jsonb columns are `unknown` on the way out: the repository parses them
// with the shared schemas before anything else sees them. Kysely sends jsonb as a JSON string.
type Jsonb = ColumnType<unknown, string, string>;

export interface DesignTable {
  id: Generated<string>;
  owner_id: string;
  title: string;
  notes: ColumnType<string, string | undefined, string>;
  data: Jsonb;
  thumbnail_svg: string;
  version: ColumnType<number, number | undefined, number>;
  summary: ColumnType<unknown, string | null, string | null>;
  /** The version `summary` was computed for; while it differs from `version` the figures are still being
   * computed (migration 2026_12_04_1200). */
  summary_version: ColumnType<number | null, number | null | undefined, number | null>;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
  deleted_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  /** Set when the design is a copy of a published template version (migration 2026_12_02_1610). */
  copied_from_template_version_id: ColumnType<string | null, string | null | undefined, string | null>;
}
export type DesignRow = Selectable<DesignTable>;

export interface DesignVersionTable {
  design_id: string;
  version: number;
  title: string;
  notes: string;
  data: Jsonb;
  saved_at: CreatedAt;
}
export type DesignVersionRow = Selectable<DesignVersionTable>;

export type DesignRouteKind = 'planned' | 'own';

export interface DesignRouteTable {
  design_id: string;
  kind: DesignRouteKind;
  strokes: Jsonb;
  summary: Jsonb;
  design_version: number;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}
export type DesignRouteRow = Selectable<DesignRouteTable>;

/** A quilt map owned by one account (migration 2026_12_05_0930); `data` is checked by shared/quilt/quilt.schema.ts. */
export interface QuiltTable {
  id: Generated<string>;
  owner_id: string;
  title: string;
  data: Jsonb;
  version: ColumnType<number, number | undefined, number>;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
  deleted_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  /** The class whose dated lessons give the schedule (migration 2026_12_05_1245); null: one block a month. */
  class_id: ColumnType<string | null, string | null | undefined, string | null>;
  /** A calendar date: the monthly schedule's first block (null: the day the quilt was made). Select with to_char. */
  schedule_start: ColumnType<Date | null, string | null | undefined, string | null>;
}
export type QuiltRow = Selectable<QuiltTable>;

/**
 * A design's corner-pair plans (migration 2026_12_05_1215) in its own corners and units, for one design version and
 * one set of planner settings; `pairs` is checked by shared/quilt/cornerCosts.ts designCornerCostsSchema when read.
 */
export interface CornerCostTable {
  design_id: string;
  design_version: number;
  settings_key: string;
  pairs: Jsonb;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}
export type CornerCostRow = Selectable<CornerCostTable>;

export type QuiltPlanJobState = 'queued' | 'running' | 'done' | 'failed';

/** One whole-quilt plan of a quilt version over given design versions (`inputs_key`), run by a planning worker. */
export interface QuiltPlanJobTable {
  id: Generated<string>;
  quilt_id: string;
  owner_id: string;
  quilt_version: number;
  inputs_key: string;
  state: ColumnType<QuiltPlanJobState, QuiltPlanJobState | undefined, QuiltPlanJobState>;
  done: ColumnType<number, number | undefined, number>;
  total: ColumnType<number, number | undefined, number>;
  attempts: ColumnType<number, number | undefined, number>;
  queue_job_id: string | null;
  result: Jsonb | null;
  failure: Jsonb | null;
  created_at: CreatedAt;
  updated_at: UpdatedAt;
}
export type QuiltPlanJobRow = Selectable<QuiltPlanJobTable>;
export type PaymentStateColumn = 'pending' | 'paid' | 'refunded' | 'expired';

/** One student's checkout for one paid class (migration 2026_12_05_1215; shared/payments/paymentState.ts). */
export interface ClassPaymentTable {
  id: Generated<string>;
  class_id: string | null;
  teacher_id: string | null;
  class_title: string;
  student_id: string;
  /** In the currency's minor unit (cents). */
  amount: number;
  currency: string;
  state: ColumnType<PaymentStateColumn, PaymentStateColumn | undefined, PaymentStateColumn>;
  /** The student's locale when they paid (first Accept-Language tag): the receipt is written in it. */
  locale: string | null;
  checkout_session_id: string | null;
  payment_intent_id: string | null;
  created_at: CreatedAt;
  paid_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  refunded_at: ColumnType<Date | null, Date | null | undefined, Date | null>;
  updated_at: UpdatedAt;
}

/** A webhook event applied (or waiting for its payment), keyed by the payments service's event id. */
export interface PaymentEventTable {
  event_id: string;
  type: string;
  payment_id: string | null;
  payment_intent_id: string | null;
  occurred_at: ColumnType<Date, Date, never>;
  received_at: CreatedAt;
  applied: boolean;
}
