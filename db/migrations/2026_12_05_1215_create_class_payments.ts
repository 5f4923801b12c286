import { sql, type Kysely } from 'kysely';

// Frozen in time: never import app code here, never edit after merge.
// Paid classes. A `class_payment` is one student's checkout for one class: pending until the payments service's
// signed webhook says it completed (paid), then possibly refunded; a checkout never finished expires. The amount and
// currency are copied from the class when the checkout starts (the teacher may change the price later), and the
// class title too, so the payments table still reads after a class is deleted (class_id then goes null).
// `payment_event` keeps every webhook event applied, keyed by the service's event id: a redelivered event finds
// its id taken and changes nothing. `enrollment.access_until`: a refunded student keeps the lessons released up to
// that instant and no later ones. `enrollment.joined_via` gains 'payment'.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('class_payment')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('class_id', 'uuid', (c) => c.references('class.id').onDelete('set null'))
    .addColumn('teacher_id', 'uuid', (c) => c.references('account.id').onDelete('set null'))
    .addColumn('class_title', 'text', (c) => c.notNull())
    .addColumn('student_id', 'uuid', (c) => c.notNull().references('account.id').onDelete('cascade'))
    .addColumn('amount', 'integer', (c) => c.notNull().check(sql`amount > 0`))
    .addColumn('currency', 'text', (c) => c.notNull().check(sql`currency ~ '^[A-Z]{3}$'`))
    .addColumn('state', 'text', (c) => c.notNull().defaultTo('pending').check(sql`state in ('pending', 'paid', 'refunded', 'expired')`))
    .addColumn('locale', 'text')
    .addColumn('checkout_session_id', 'text', (c) => c.unique())
    .addColumn('payment_intent_id', 'text', (c) => c.unique())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('paid_at', 'timestamptz')
    .addColumn('refunded_at', 'timestamptz')
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await sql`create index class_payment_class_idx on class_payment (class_id, created_at desc)`.execute(db);
  await sql`create index class_payment_teacher_idx on class_payment (teacher_id, created_at desc)`.execute(db);
  await sql`create index class_payment_student_idx on class_payment (student_id, created_at desc)`.execute(db);

  await db.schema
    .createTable('payment_event')
    .addColumn('event_id', 'text', (c) => c.primaryKey())
    .addColumn('type', 'text', (c) => c.notNull())
    .addColumn('payment_id', 'uuid', (c) => c.references('class_payment.id').onDelete('cascade'))
    // A refund names the payment only by its payment intent; seen before the completion that tells us that id,
    // it waits here unapplied and the completion applies it.
    .addColumn('payment_intent_id', 'text')
    .addColumn('occurred_at', 'timestamptz', (c) => c.notNull())
    .addColumn('received_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('applied', 'boolean', (c) => c.notNull())
    .execute();
  await sql`create index payment_event_waiting_idx on payment_event (payment_intent_id) where not applied`.execute(db);

  await db.schema.alterTable('enrollment').addColumn('access_until', 'timestamptz').execute();
  await sql`alter table enrollment drop constraint enrollment_joined_via_check`.execute(db);
  await sql`alter table enrollment add constraint enrollment_joined_via_check check (joined_via in ('invitation', 'join-code', 'payment'))`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`delete from enrollment where joined_via = 'payment'`.execute(db);
  await sql`alter table enrollment drop constraint enrollment_joined_via_check`.execute(db);
  await sql`alter table enrollment add constraint enrollment_joined_via_check check (joined_via in ('invitation', 'join-code'))`.execute(db);
  await db.schema.alterTable('enrollment').dropColumn('access_until').execute();
  await db.schema.dropTable('payment_event').execute();
  await db.schema.dropTable('class_payment').execute();
}
