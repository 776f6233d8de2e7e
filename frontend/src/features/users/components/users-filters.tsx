import { useEffect, useRef, useState } from 'react';
import { isRole } from '@shared/roles';
import type { UserListQuery, UserStatus } from '@shared/schemas/users.schema';
import { SelectField, TextField } from '@/components/ui/field';
import { ROLE_OPTIONS, STATUS_OPTIONS } from './user-labels';

const SEARCH_DELAY_MS = 300;

const isStatus = (value: string): value is UserStatus => STATUS_OPTIONS.some((o) => o.value === value);

interface UsersFiltersProps {
  query: UserListQuery;
  onChange: (patch: Partial<UserListQuery>, options?: { replace?: boolean }) => void;
}

/** Search by name or e-mail, and filter by role and status. */
export function UsersFilters({ query, onChange }: UsersFiltersProps) {
  const [text, setText] = useState(query.q ?? '');
  const lastSent = useRef(query.q ?? '');

  // The address changed from elsewhere (back button, "clear filters"): show what it says.
  useEffect(() => {
    const q = query.q ?? '';
    if (q !== lastSent.current) {
      lastSent.current = q;
      setText(q);
    }
  }, [query.q]);

  useEffect(() => {
    const q = text.trim();
    if (q === lastSent.current) return;
    const timer = window.setTimeout(() => {
      lastSent.current = q;
      onChange({ q: q || undefined }, { replace: true });
    }, SEARCH_DELAY_MS);
    return () => window.clearTimeout(timer);
  }, [text, onChange]);

  return (
    <div role="search" aria-label="Search and filter users" className="grid grid-cols-1 gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)]">
      <TextField
        label="Search users"
        type="search"
        placeholder="Name or e-mail"
        value={text}
        onChange={(event) => setText(event.target.value)}
        onKeyDown={(event) => {
          if (event.key === 'Enter') {
            event.preventDefault();
            const q = text.trim();
            lastSent.current = q;
            onChange({ q: q || undefined });
          }
        }}
        autoComplete="off"
        spellCheck={false}
      />
      <SelectField
        label="Filter by role"
        placeholder="All roles"
        options={ROLE_OPTIONS}
        value={query.role ?? ''}
        onChange={(event) => {
          const value = event.target.value;
          onChange({ role: isRole(value) ? value : undefined });
        }}
      />
      <SelectField
        label="Filter by status"
        placeholder="All statuses"
        options={STATUS_OPTIONS}
        value={query.status ?? ''}
        onChange={(event) => {
          const value = event.target.value;
          onChange({ status: isStatus(value) ? value : undefined });
        }}
      />
    </div>
  );
}
