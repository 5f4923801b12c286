import type { Migration, MigrationProvider } from 'kysely';
import * as createAccounts from './2026_12_02_1400_create_accounts.ts';
import * as createDesigns from './2026_12_02_1500_create_designs.ts';
import * as createTeaching from './2026_12_02_1600_create_teaching.ts';
import * as addDesignTemplateSource from './2026_12_02_1610_add_design_template_source.ts';
import * as repairCopiedDesignSummaries from './2026_12_04_0900_repair_copied_design_summaries.ts';
import * as hardenAccounts from './2026_12_04_1710_harden_accounts.ts';
import * as addDesignSummaryVersion from './2026_12_04_1800_add_design_summary_version.ts';
import * as addProgressClientAt from './2026_12_05_0900_add_progress_client_at.ts';
import * as createQuilts from './2026_12_05_0930_create_quilts.ts';
import * as createQuiltPlanJobs from './2026_12_05_1215_create_quilt_plan_jobs.ts';
import * as createClassPayments from './2026_12_05_1215_create_class_payments.ts';
import * as addQuiltSchedule from './2026_12_05_1245_add_quilt_schedule.ts';

/** Every migration, in order. Add new ones at the end; names sort alphanumerically by date. */
export const migrations: Record<string, Migration> = {
  '2026_12_02_1400_create_accounts': createAccounts,
  '2026_12_02_1500_create_designs': createDesigns,
  '2026_12_02_1600_create_teaching': createTeaching,
  '2026_12_02_1610_add_design_template_source': addDesignTemplateSource,
  '2026_12_04_0900_repair_copied_design_summaries': repairCopiedDesignSummaries,
  '2026_12_04_1710_harden_accounts': hardenAccounts,
  '2026_12_04_1800_add_design_summary_version': addDesignSummaryVersion,
  '2026_12_05_0900_add_progress_client_at': addProgressClientAt,
  '2026_12_05_0930_create_quilts': createQuilts,
  '2026_12_05_1215_create_quilt_plan_jobs': createQuiltPlanJobs,
  '2026_12_05_1215_create_class_payments': createClassPayments,
  '2026_12_05_1245_add_quilt_schedule': addQuiltSchedule,
};

export const migrationProvider: MigrationProvider = {
  getMigrations: async () => migrations,
};
