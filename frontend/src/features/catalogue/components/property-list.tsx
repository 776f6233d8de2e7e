import type { ReactNode } from 'react';

export interface Property {
  label: string;
  value: ReactNode;
  /** A line under the value: where it comes from, or what it means. */
  note?: ReactNode;
}

/** Labelled values in a grid that stacks on a phone; an empty value reads "Not recorded". */
export function PropertyList({ items, label }: { items: Property[]; label?: string }) {
  return (
    <dl aria-label={label} className="grid grid-cols-1 gap-x-6 gap-y-3 sm:grid-cols-2">
      {items.map((item) => (
        <div key={item.label} className="flex flex-col border-b border-ink-100 pb-2">
          <dt className="text-sm text-ink-600">{item.label}</dt>
          <dd className="font-semibold text-ink-950">{item.value ?? <span className="font-normal text-ink-600">Not recorded</span>}</dd>
          {item.note ? <dd className="text-sm text-ink-700">{item.note}</dd> : null}
        </div>
      ))}
    </dl>
  );
}
