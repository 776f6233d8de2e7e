import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { TextField } from '@/components/ui/field';
import { numberOrNull, textOrNull } from './form-values';
import { MeasureField } from './measure-field';
import { TextAreaField } from './text-area-field';

/** The fields every field record has: when, the work order, the hour meter and a note. All optional. */
export interface EventFieldValues {
  /** `datetime-local` text; blank means now. */
  occurredAt: string;
  workOrder: string;
  hourMeterHours: string;
  note: string;
}

export const EVENT_FIELD_DEFAULTS: EventFieldValues = { occurredAt: '', workOrder: '', hourMeterHours: '', note: '' };
export const EVENT_FIELD_NAMES = ['occurredAt', 'workOrder', 'hourMeterHours', 'note'] as const;

/** A local date and time as typed, as an instant the API takes; invalid text is passed on for the schema to refuse. */
function instant(local: string): string | undefined {
  if (!local.trim()) return undefined;
  const at = new Date(local);
  return Number.isNaN(at.getTime()) ? local : at.toISOString();
}

export function eventRequestFields(values: EventFieldValues) {
  return {
    occurredAt: instant(values.occurredAt),
    workOrder: textOrNull(values.workOrder),
    hourMeterHours: numberOrNull(values.hourMeterHours),
    note: textOrNull(values.note),
  };
}

interface EventFieldsProps<F extends EventFieldValues> {
  register: UseFormRegister<F>;
  errors: FieldErrors<EventFieldValues>;
  /** Whether the equipment has an hour meter to read; unknown shows the field. */
  hourMeter?: boolean;
  /** The note's label, when the note is the point of the form. */
  noteLabel?: string;
  noteHint?: string;
  /** Leaves out the note, for forms whose main text is their own field. */
  withoutNote?: boolean;
}

export function EventFields<F extends EventFieldValues>({ register, errors, hourMeter = true, noteLabel = 'Note (optional)', noteHint, withoutNote }: EventFieldsProps<F>) {
  const reg = register as unknown as UseFormRegister<EventFieldValues>;
  return (
    <div className="flex flex-col gap-4">
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <TextField label="When (optional)" hint="Leave empty for now." type="datetime-local" error={errors.occurredAt?.message} {...reg('occurredAt')} />
        <TextField label="Work order (optional)" autoComplete="off" autoCapitalize="characters" error={errors.workOrder?.message} {...reg('workOrder')} />
        {hourMeter ? (
          <MeasureField label="Hour meter (optional)" unit="h" error={errors.hourMeterHours?.message} {...reg('hourMeterHours')} />
        ) : null}
      </div>
      {withoutNote ? null : <TextAreaField label={noteLabel} hint={noteHint} error={errors.note?.message} {...reg('note')} />}
    </div>
  );
}
