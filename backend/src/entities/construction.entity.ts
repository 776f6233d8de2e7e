import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { ElectricalProperty, Reinforcement } from '../../../shared/src/checks/types.js';

/** A hose build the plant buys, under the plant's own code. Pressures kPa, lengths mm, temperatures °C. */
@Entity({ name: 'constructions' })
export class Construction {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('constructions_code_key', { unique: true })
  @Column({ type: 'text' })
  code: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ name: 'tube_compound', type: 'text', nullable: true })
  tubeCompound: string | null;

  @Column({ type: 'text', nullable: true })
  reinforcement: Reinforcement | null;

  @Column({ name: 'cover_compound', type: 'text', nullable: true })
  coverCompound: string | null;

  @Index('constructions_size_code_idx')
  @Column({ name: 'size_code', type: 'text' })
  sizeCode: string;

  @Column({ name: 'working_pressure_kpa', type: 'double precision', nullable: true })
  workingPressureKpa: number | null;

  @Column({ name: 'burst_pressure_kpa', type: 'double precision', nullable: true })
  burstPressureKpa: number | null;

  /** Vacuum withstood, kPa below atmospheric; null when not rated for vacuum. */
  @Column({ name: 'vacuum_rating_kpa', type: 'double precision', nullable: true })
  vacuumRatingKpa: number | null;

  @Column({ name: 'min_temp_c', type: 'double precision', nullable: true })
  minTempC: number | null;

  @Column({ name: 'max_temp_c', type: 'double precision', nullable: true })
  maxTempC: number | null;

  @Column({ name: 'min_bend_radius_mm', type: 'double precision', nullable: true })
  minBendRadiusMm: number | null;

  @Column({ name: 'weight_kg_per_m', type: 'double precision', nullable: true })
  weightKgPerM: number | null;

  @Column({ type: 'text', nullable: true })
  electrical: ElectricalProperty | null;

  @Column({ name: 'food_contact_certified', type: 'boolean', nullable: true })
  foodContactCertified: boolean | null;

  /** Free text: the plant's supplier and part number. */
  @Column({ type: 'text', nullable: true })
  maker: string | null;

  @Column({ name: 'part_number', type: 'text', nullable: true })
  partNumber: string | null;

  @Column({ name: 'service_life_months', type: 'integer', nullable: true })
  serviceLifeMonths: number | null;

  @Column({ name: 'shelf_life_months', type: 'integer', nullable: true })
  shelfLifeMonths: number | null;

  @Column({ name: 'storage_life_months', type: 'integer', nullable: true })
  storageLifeMonths: number | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
