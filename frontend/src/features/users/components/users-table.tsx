import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  type Table as TanStackTable,
} from '@tanstack/react-table';
import { ROLE_LABELS } from '@shared/roles';
import { USER_SORTS, type UserDto, type UserListQuery } from '@shared/schemas/users.schema';
import { paths } from '@/config/paths';
import { formatDate, formatDateTime, formatDay } from '@/lib/format';
import { SelectField } from '@/components/ui/field';
import { ServerTable, useServerTable } from '@/components/ui/server-table';
import { describeUserSites } from './user-labels';
import { UserStatusBadge } from './user-status-badge';

type UserSort = (typeof USER_SORTS)[number];
const isUserSort = (value: string): value is UserSort => (USER_SORTS as readonly string[]).includes(value);

const column = createColumnHelper<UserDto>();

const nameLinkClasses = 'font-semibold text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800';

const columns = [
  column.accessor('name', {
    header: 'Name',
    cell: (info) => (
      <Link to={paths.users.detail.getHref(info.row.original.id)} className={`${nameLinkClasses} whitespace-nowrap`}>
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor('email', { header: 'E-mail', cell: (info) => <BreakableEmail email={info.getValue()} /> }),
  column.accessor('role', { header: 'Role', cell: (info) => ROLE_LABELS[info.getValue()] }),
  column.display({ id: 'sites', header: 'Sites', enableSorting: false, cell: (info) => describeUserSites(info.row.original) }),
  column.accessor('status', { header: 'Status', enableSorting: false, cell: (info) => <UserStatusBadge status={info.getValue()} /> }),
  column.accessor('accessExpiresOn', {
    header: 'Access expires',
    enableSorting: false,
    cell: (info) => {
      const value = info.getValue();
      return value ? <span className="whitespace-nowrap">{formatDate(value)}</span> : <span className="text-ink-600">No end date</span>;
    },
  }),
  column.accessor('lastSignInAt', {
    header: 'Last sign-in',
    cell: (info) => {
      const value = info.getValue();
      return value ? (
        <time dateTime={value} title={formatDateTime(value)} className="whitespace-nowrap">
          {formatDay(value)}
        </time>
      ) : (
        <span className="text-ink-600">Never</span>
      );
    },
  }),
];

interface UsersTableOptions {
  users: UserDto[];
  total: number;
  query: UserListQuery;
  onQueryChange: (patch: Partial<UserListQuery>) => void;
}

/** The table's state is the address's: sorting and paging happen on the server. */
export function useUsersTable({ users, total, query, onQueryChange }: UsersTableOptions) {
  return useServerTable({ data: users, columns, total, query, onQueryChange, isSort: isUserSort, getRowId: (row) => row.id });
}

/** A desktop table of users; on a phone the same rows show as cards. */
export function UsersTable({ table, busy }: { table: TanStackTable<UserDto>; busy: boolean }) {
  return (
    <>
      <div className="hidden md:block" aria-busy={busy || undefined}>
        <ServerTable table={table} label="Users" />
      </div>
      <UserCards table={table} busy={busy} />
    </>
  );
}

const PHONE_SORTS: Array<{ value: string; label: string }> = [
  { value: 'name:asc', label: 'Name, A to Z' },
  { value: 'name:desc', label: 'Name, Z to A' },
  { value: 'email:asc', label: 'E-mail, A to Z' },
  { value: 'role:asc', label: 'Role' },
  { value: 'lastSignInAt:desc', label: 'Last sign-in, latest first' },
  { value: 'lastSignInAt:asc', label: 'Last sign-in, earliest first' },
  { value: 'createdAt:desc', label: 'Newest accounts first' },
];

function UserCards({ table, busy }: { table: TanStackTable<UserDto>; busy: boolean }) {
  const current = table.getState().sorting[0];
  const value = current ? `${current.id}:${current.desc ? 'desc' : 'asc'}` : 'name:asc';
  const options = PHONE_SORTS.some((o) => o.value === value) ? PHONE_SORTS : [...PHONE_SORTS, { value, label: 'Current order' }];

  return (
    <div className="flex flex-col gap-3 md:hidden">
      <SelectField
        label="Sort by"
        options={options}
        value={value}
        onChange={(event) => {
          const [id = 'name', dir] = event.target.value.split(':');
          table.setSorting([{ id, desc: dir === 'desc' }]);
        }}
      />
      <ul className="flex flex-col gap-3" aria-label="Users" aria-busy={busy || undefined}>
        {table.getRowModel().rows.map((row) => {
          const user = row.original;
          return (
            <li key={row.id} className="rounded-[var(--radius-card)] border border-ink-200 bg-white p-4 shadow-sm">
              <div className="flex items-start justify-between gap-3">
                <Link to={paths.users.detail.getHref(user.id)} className={`${nameLinkClasses} inline-flex min-h-11 items-center text-lg`}>
                  {user.name}
                </Link>
                <UserStatusBadge status={user.status} />
              </div>
              <p className="break-all text-ink-700">{user.email}</p>
              <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-2 text-sm">
                <div>
                  <dt className="text-ink-600">Role</dt>
                  <dd className="font-semibold text-ink-950">{ROLE_LABELS[user.role]}</dd>
                </div>
                <div>
                  <dt className="text-ink-600">Sites</dt>
                  <dd className="font-semibold text-ink-950">{describeUserSites(user)}</dd>
                </div>
                <div>
                  <dt className="text-ink-600">Access expires</dt>
                  <dd className="font-semibold text-ink-950">{user.accessExpiresOn ? formatDate(user.accessExpiresOn) : 'No end date'}</dd>
                </div>
                <div>
                  <dt className="text-ink-600">Last sign-in</dt>
                  <dd className="font-semibold text-ink-950">{user.lastSignInAt ? formatDateTime(user.lastSignInAt) : 'Never'}</dd>
                </div>
              </dl>
            </li>
          );
        })}
      </ul>
    </div>
  );
}

/** An e-mail address that may wrap after its @ and dots, never inside a word. */
function BreakableEmail({ email }: { email: string }) {
  const parts = email.split(/(?<=[@.])/);
  return (
    <span>
      {parts.map((part, i) => (
        <span key={i}>
          {part}
          {i < parts.length - 1 ? <wbr /> : null}
        </span>
      ))}
    </span>
  );
}
