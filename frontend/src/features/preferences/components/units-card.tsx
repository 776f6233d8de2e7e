import { useId } from 'react';
import type { Preferences } from '@shared/schemas/auth.schema';
import { paths } from '@/config/paths';
import { lengthSymbol, pressureSymbol, temperatureSymbol } from '@/lib/units-display';
import { TextLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';

/** The units the user's values are shown in, with the way to change them. */
export function UnitsCard({ preferences }: { preferences: Preferences }) {
  const titleId = useId();
  const rows = [
    { label: 'Pressure', value: pressureSymbol(preferences.pressureUnit) },
    { label: 'Length', value: lengthSymbol(preferences.lengthUnit) },
    { label: 'Temperature', value: temperatureSymbol(preferences.temperatureUnit) },
  ];
  return (
    <Card labelledBy={titleId}>
      <CardHeader title="Your units" titleId={titleId} description="Values are shown in these units." />
      <CardBody className="flex flex-col gap-2">
        <dl className="grid grid-cols-1 gap-3 sm:grid-cols-3">
          {rows.map((row) => (
            <div key={row.label} className="flex flex-col rounded-[var(--radius-control)] bg-ink-50 px-3 py-2">
              <dt className="text-sm text-ink-600">{row.label}</dt>
              <dd className="text-xl font-bold text-ink-950">{row.value}</dd>
            </div>
          ))}
        </dl>
        <TextLink to={paths.preferences.getHref()} className="self-start">
          Change units
        </TextLink>
      </CardBody>
    </Card>
  );
}
