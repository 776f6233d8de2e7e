import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { Area } from './area.entity.js';

/** A machine or fixed plant item that carries hose positions; `assetNumber` is the plant's own. */
@Entity({ name: 'equipment' })
@Index('equipment_site_asset_number_key', ['siteId', 'assetNumber'], { unique: true })
export class Equipment {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('equipment_site_id_idx')
  @Column({ name: 'site_id', type: 'uuid' })
  siteId: string;

  @Index('equipment_area_id_idx')
  @Column({ name: 'area_id', type: 'uuid' })
  areaId: string;

  @ManyToOne(() => Area, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'area_id' })
  area?: Relation<Area>;

  @Column({ name: 'asset_number', type: 'text' })
  assetNumber: string;

  @Column({ type: 'text' })
  name: string;

  /** Whether the equipment has an hour meter that technicians read at events. */
  @Column({ name: 'has_hour_meter', type: 'boolean', default: false })
  hasHourMeter: boolean;

  /** The latest hour-meter reading, hours. */
  @Column({ name: 'hour_meter_hours', type: 'double precision', nullable: true })
  hourMeterHours: number | null;

  @Column({ name: 'hour_meter_read_at', type: 'timestamptz', nullable: true })
  hourMeterReadAt: Date | null;

  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
