import { formatDate } from '@shared/format/dates.ts';
import { useEffect, useRef, useState, type FormEvent } from 'react';
import { FormAlert } from '../ui/FormAlert.tsx';
import { buttonClass } from '../ui/SubmitButton.tsx';
import { sendJson } from '../ui/submitJson.ts';

type Role = 'quilter' | 'teacher' | 'admin';
interface Row {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  units: 'in' | 'cm';
  createdAt: string;
}
interface Page {
  accounts: Row[];
  total: number;
  page: number;
  pageSize: number;
}

const ROLES: Role[] = ['quilter', 'teacher', 'admin'];
const PAGE_SIZE = 20;

/** What a role may do, for the question before a change. */
const ROLE_MEANS: Record<Role, string> = {
  quilter: 'draws designs and joins classes',
  teacher: 'also publishes templates and runs classes',
  admin: 'also changes roles and manages every class',
};
const article = (role: Role) => (role === 'admin' ? 'an' : 'a');

/** The question before a role change, in plain words (what the person gains or loses). */
export function roleChangeQuestion(name: string, from: Role, to: Role): string {
  const keeps = from === 'teacher' && to === 'quilter' ? ' Their classes and templates stay; admins can manage the classes.' : '';
  return `Make ${name} ${article(to)} ${to}? ${article(to) === 'an' ? 'An' : 'A'} ${to} ${ROLE_MEANS[to]}.${keeps}`;
}

/** Admin table: search accounts (GET /api/admin/accounts) and change roles (PATCH /api/admin/accounts/:id). */
export default function AdminAccounts({ currentAccountId }: { currentAccountId: string }) {
  const [query, setQuery] = useState('');
  const [searched, setSearched] = useState('');
  const [page, setPage] = useState(1);
  const [data, setData] = useState<Page | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  /** A role change waiting for the admin's yes. */
  const [pending, setPending] = useState<{ row: Row; role: Role } | null>(null);
  /** A refusal shown beside the account it is about (e.g. the last admin). */
  const [rowError, setRowError] = useState<{ id: string; message: string } | null>(null);
  const confirmRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (pending) confirmRef.current?.focus();
  }, [pending]);

  async function load(q: string, p: number) {
    const params = new URLSearchParams({ q, page: String(p), pageSize: String(PAGE_SIZE) });
    const outcome = await sendJson<Page>('GET', `/api/admin/accounts?${params}`);
    if (outcome.ok) {
      setData(outcome.data);
      setError(null);
    } else setError(outcome.error.message);
  }
  useEffect(() => {
    void load(searched, page);
  }, [searched, page]);

  function onSearch(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setPage(1);
    setSearched(query.trim());
  }

  async function changeRole(row: Row, role: Role) {
    setPending(null);
    setNotice(null);
    setRowError(null);
    const outcome = await sendJson<{ account: Row }>('PATCH', `/api/admin/accounts/${row.id}`, { role });
    if (!outcome.ok) {
      // A refusal about this account (the last admin) is shown beside it; anything else above the table.
      if (outcome.error.code === 'last_admin') setRowError({ id: row.id, message: outcome.error.message });
      else setError(outcome.error.message);
      await load(searched, page);
      return;
    }
    setError(null);
    setNotice(`${outcome.data.account.displayName} is now ${outcome.data.account.role === 'admin' ? 'an' : 'a'} ${outcome.data.account.role}.`);
    setData((d) => d && { ...d, accounts: d.accounts.map((a) => (a.id === row.id ? outcome.data.account : a)) });
  }

  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  return (
    <div className="flex flex-col gap-4">
      <form role="search" onSubmit={onSearch} className="flex flex-wrap items-end gap-2">
        <div className="flex flex-col gap-1">
          <label htmlFor="account-search" className="font-semibold">
            Search by name or e-mail
          </label>
          <input
            id="account-search"
            type="search"
            value={query}
            maxLength={100}
            onChange={(e) => setQuery(e.target.value)}
            className="w-72 max-w-full rounded-md border border-muslin-300 bg-white px-3 py-2"
          />
        </div>
        <button type="submit" className={buttonClass.primary}>
          Search
        </button>
      </form>
      <FormAlert tone="error" message={error} />
      <FormAlert tone="success" message={notice} />
      {pending && (
        <div role="group" aria-labelledby="role-question" className="flex flex-col gap-3 rounded-lg border border-denim-500 bg-white p-4">
          <p id="role-question" className="font-semibold">
            {roleChangeQuestion(pending.row.displayName, pending.row.role, pending.role)}
          </p>
          <div className="flex flex-wrap gap-3">
            <button type="button" ref={confirmRef} className={buttonClass.primary} onClick={() => void changeRole(pending.row, pending.role)}>
              Yes, make {pending.row.displayName} {article(pending.role)} {pending.role}
            </button>
            <button type="button" className={buttonClass.quiet} onClick={() => setPending(null)}>
              Cancel
            </button>
          </div>
        </div>
      )}
      <div className="overflow-x-auto rounded-lg border border-muslin-200 bg-white">
        <table className="w-full min-w-[36rem] text-left">
          <caption className="sr-only">Accounts{data ? `, ${data.total} found` : ''}</caption>
          <thead className="bg-muslin-100">
            <tr>
              <th scope="col" className="px-3 py-2">Name</th>
              <th scope="col" className="px-3 py-2">E-mail</th>
              <th scope="col" className="px-3 py-2">Joined</th>
              <th scope="col" className="px-3 py-2">Role</th>
            </tr>
          </thead>
          <tbody>
            {data?.accounts.map((row) => (
              <tr key={row.id} className="border-t border-muslin-200">
                <td className="px-3 py-2 font-semibold">
                  {row.displayName}
                  {row.id === currentAccountId && <span className="ml-2 text-sm font-normal text-denim-700">(you)</span>}
                </td>
                <td className="px-3 py-2 break-all">{row.email}</td>
                <td className="px-3 py-2 whitespace-nowrap"><time dateTime={row.createdAt}>{formatDate(row.createdAt, 'day')}</time></td>
                <td className="px-3 py-2">
                  <select
                    aria-label={`Role of ${row.displayName}`}
                    aria-describedby={rowError?.id === row.id ? `role-error-${row.id}` : undefined}
                    value={pending?.row.id === row.id ? pending.role : row.role}
                    onChange={(e) => {
                      setRowError(null);
                      const role = e.target.value as Role;
                      setPending(role === row.role ? null : { row, role });
                    }}
                    className="rounded-md border border-muslin-300 bg-white px-2 py-1"
                  >
                    {ROLES.map((r) => (
                      <option key={r} value={r}>
                        {r}
                      </option>
                    ))}
                  </select>
                  {rowError?.id === row.id && (
                    <p id={`role-error-${row.id}`} className="mt-1 text-sm font-semibold text-madder-600">
                      {rowError.message}
                    </p>
                  )}
                </td>
              </tr>
            ))}
            {data && data.accounts.length === 0 && (
              <tr>
                <td colSpan={4} className="px-3 py-6 text-center">
                  No accounts match “{searched}”.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      {data && (
        <nav aria-label="Account pages" className="flex items-center gap-3">
          <button type="button" className={buttonClass.quiet} disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
            Previous
          </button>
          <span aria-live="polite">
            Page {data.page} of {pages} · {data.total} account{data.total === 1 ? '' : 's'}
          </span>
          <button type="button" className={buttonClass.quiet} disabled={page >= pages} onClick={() => setPage((p) => p + 1)}>
            Next
          </button>
        </nav>
      )}
    </div>
  );
}
