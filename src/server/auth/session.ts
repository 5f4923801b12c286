import type { Role, UnitsPreference } from '../../../db/schema.ts';

export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  units: UnitsPreference;
}
export interface SessionInfo {
  id: string;
  expiresAt: Date;
}
