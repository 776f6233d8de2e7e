import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { SIZE_CLASS_CODES, sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatLength, formatPressure, NO_VALUE } from '@shared/units/units';
import { EmptyState } from '@/components/ui/empty-state';
import { TBody, Td, Th, THead, Table, Tr } from '@/components/ui/table';
import { useUnits } from '../hooks/use-units';

/** Each size of a fitting type with its rating and crimp diameter ± tolerance, in the reader's units. */
export function FittingSizesTable({ fittingType }: { fittingType: FittingTypeDto }) {
  const units = useUnits();
  if (fittingType.sizes.length === 0) {
    return (
      <EmptyState title="No sizes listed">
        {fittingType.abilities.update
          ? 'Edit the fitting type to add the sizes it is made in, each with its rating.'
          : 'No size of this fitting has been recorded yet.'}
      </EmptyState>
    );
  }
  const sizes = [...fittingType.sizes].sort((a, b) => SIZE_CLASS_CODES.indexOf(a.sizeCode) - SIZE_CLASS_CODES.indexOf(b.sizeCode));
  const crimp = (d: number | null, t: number | null) =>
    d == null ? NO_VALUE : t == null ? formatLength(d, units.lengthUnit) : `${formatLength(d, units.lengthUnit)} ± ${formatLength(t, units.lengthUnit)}`;

  return (
    <Table aria-label={`Ratings of ${fittingType.code} by size`}>
      <THead>
        <tr>
          <Th>Size</Th>
          <Th>Rating</Th>
          <Th>Crimp diameter</Th>
        </tr>
      </THead>
      <TBody>
        {sizes.map((s) => (
          <Tr key={s.sizeCode}>
            <Td className="font-semibold whitespace-nowrap">{sizeLabel(s.sizeCode, units.lengthUnit)}</Td>
            <Td className="whitespace-nowrap tabular-nums">{s.ratingKpa == null ? <span className="text-ink-600">Not rated</span> : formatPressure(s.ratingKpa, units.pressureUnit)}</Td>
            <Td className="whitespace-nowrap tabular-nums">{crimp(s.crimpDiameterMm, s.crimpToleranceMm)}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
