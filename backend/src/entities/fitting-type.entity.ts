import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** One size a fitting type comes in: its pressure rating (kPa) and crimp specification (mm). */
export interface FittingSize {
  sizeCode: string;
  ratingKpa: number | null;
  crimpDiameterMm: number | null;
  crimpToleranceMm: number | null;
}

/** An end fitting the plant uses: style, material and a rating per nominal size. */
@Entity({ name: 'fitting_types' })
export class FittingType {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('fitting_types_code_key', { unique: true })
  @Column({ type: 'text' })
  code: string;

  @Column({ type: 'text' })
  name: string;

  /** crimped, banded, claw, cam-groove, threaded, flanged, sanitary-clamp. */
  @Column({ type: 'text' })
  style: string;

  @Column({ type: 'text' })
  material: string;

  @Column({ type: 'jsonb', default: () => "'[]'" })
  sizes: FittingSize[];

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true })
  archivedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
