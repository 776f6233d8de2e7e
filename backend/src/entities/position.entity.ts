import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { Criticality } from '../../../shared/src/services/criticality.js';
import { Equipment } from './equipment.entity.js';

/** One hose point on a piece of equipment; its code stays when the hose in it is replaced. */
@Entity({ name: 'positions' })
@Index('positions_site_code_key', ['siteId', 'code'], { unique: true })
export class Position {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('positions_site_id_idx')
  @Column({ name: 'site_id', type: 'uuid' })
  siteId: string;

  @Index('positions_equipment_id_idx')
  @Column({ name: 'equipment_id', type: 'uuid' })
  equipmentId: string;

  @ManyToOne(() => Equipment, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'equipment_id' })
  equipment?: Relation<Equipment>;

  @Column({ type: 'text' })
  code: string;

  @Column({ type: 'text' })
  name: string;

  @Index('positions_service_code_idx')
  @Column({ name: 'service_code', type: 'text' })
  serviceCode: string;

  @Column({ name: 'medium_code', type: 'text', nullable: true })
  mediumCode: string | null;

  @Column({ name: 'max_operating_pressure_kpa', type: 'double precision', nullable: true })
  maxOperatingPressureKpa: number | null;

  @Column({ name: 'min_temp_c', type: 'double precision', nullable: true })
  minTempC: number | null;

  @Column({ name: 'max_temp_c', type: 'double precision', nullable: true })
  maxTempC: number | null;

  @Column({ name: 'size_code', type: 'text' })
  sizeCode: string;

  @Column({ name: 'required_length_mm', type: 'double precision', nullable: true })
  requiredLengthMm: number | null;

  @Column({ name: 'end_a_connection', type: 'text', nullable: true })
  endAConnection: string | null;

  @Column({ name: 'end_b_connection', type: 'text', nullable: true })
  endBConnection: string | null;

  /** Null takes the service's default. */
  @Column({ name: 'suction_duty', type: 'boolean', nullable: true })
  suctionDuty: boolean | null;

  @Column({ name: 'routed_bend_radius_mm', type: 'double precision', nullable: true })
  routedBendRadiusMm: number | null;

  @Column({ type: 'text', default: 'medium' })
  criticality: Criticality;

  /** The position's own inspection interval, days; null takes the service's and criticality's. */
  @Column({ name: 'inspection_interval_days', type: 'integer', nullable: true })
  inspectionIntervalDays: number | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
