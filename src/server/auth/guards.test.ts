import { describe, expect, it } from 'vitest';
import type { Role } from '@db/schema.ts';
import { hasRole, requireRole, requireUser, safeNextPath } from './guards.ts';

const user = (role: Role) => ({ id: 'u', email: 'a@b.test', displayName: 'A', role, units: 'in' as const, createdAt: new Date(0) });
const locals = (role: Role | null): App.Locals => (role ? { user: user(role), session: { id: 's', expiresAt: new Date(0) } } : { user: null, session: null });

describe('guards', () => {
  it('ranks quilter < teacher < admin', () => {
    expect(hasRole(user('admin'), 'teacher')).toBe(true);
    expect(hasRole(user('teacher'), 'teacher')).toBe(true);
    expect(hasRole(user('quilter'), 'teacher')).toBe(false);
    expect(hasRole(user('teacher'), 'admin')).toBe(false);
    expect(hasRole(null, 'quilter')).toBe(false);
  });
  it('answers 401 for anonymous and 404 for a role too low', () => {
    const anon = requireUser(locals(null));
    expect(anon.ok ? 0 : anon.error.status).toBe(401);
    const low = requireRole(locals('quilter'), 'admin');
    expect(low.ok ? 0 : low.error.status).toBe(404);
    expect(requireRole(locals('admin'), 'teacher').ok).toBe(true);
  });
  it('returns only to local paths after sign-in', () => {
    expect(safeNextPath('/designs/12?tab=route')).toBe('/designs/12?tab=route');
    for (const bad of [null, '', 'https://evil.example', '//evil.example', '/\\evil.example', 'dashboard', `/${'x'.repeat(600)}`]) {
      expect(safeNextPath(bad)).toBe('/dashboard');
    }
  });
});
