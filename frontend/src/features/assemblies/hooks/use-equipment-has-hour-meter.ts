import { useEquipment } from '../api/get-equipment';
import { usePosition } from '../api/get-position';

/** Whether the equipment of a position has an hour meter to read; true while not known, so the field is never hidden by mistake. */
export function useEquipmentHasHourMeter(positionId: string | null | undefined): boolean {
  const position = usePosition(positionId);
  const equipment = useEquipment(position.data?.equipmentId);
  return equipment.data ? equipment.data.hasHourMeter : true;
}
