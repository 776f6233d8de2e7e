import type { LengthUnit, PressureUnit, TemperatureUnit } from '../../../shared/src/units/units.js';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A plant, mine or quarry: the unit of access. */
@Entity({ name: 'sites' })
export class Site {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('sites_code_key', { unique: true })
  @Column({ type: 'text' })
  code: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ name: 'time_zone', type: 'text', default: 'UTC' })
  timeZone: string;

  /** Units for labels and reports at this site. */
  @Column({ name: 'default_units', type: 'jsonb', default: () => `'{"lengthUnit": "mm", "pressureUnit": "bar", "temperatureUnit": "C"}'` })
  defaultUnits: { pressureUnit: PressureUnit; lengthUnit: LengthUnit; temperatureUnit: TemperatureUnit };

  /** ISO 4217 code of costs recorded at this site. */
  @Column({ type: 'text', default: 'GBP' })
  currency: string;

  /** The compressed-air restraint rule sets the site follows. */
  @Column({ name: 'rule_set_codes', type: 'text', array: true, default: () => "'{}'" })
  ruleSetCodes: string[];

  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
