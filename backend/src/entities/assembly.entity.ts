import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn, type Relation } from 'typeorm';
import type { CheckOutcome, CheckResult } from '../../../shared/src/checks/types.js';
import type { AssemblyStatus, ProofTestRecord } from '../../../shared/src/schemas/assemblies.schema.js';
import { Construction } from './construction.entity.js';
import { FittingType } from './fitting-type.entity.js';
import { Position } from './position.entity.js';

/** One physical hose with its end fittings. Lengths mm, cost in the site's currency. */
@Entity({ name: 'assemblies' })
@Index('assemblies_one_per_position', ['positionId'], { unique: true, where: `status IN ('installed', 'tagged_out')` })
@Index('assemblies_site_status_idx', ['siteId', 'status'])
export class Assembly {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** The assembly number, printed as its tag; unique for ever. */
  @Index('assemblies_number_key', { unique: true })
  @Column({ type: 'text' })
  number: string;

  @Index('assemblies_construction_id_idx')
  @Column({ name: 'construction_id', type: 'uuid' })
  constructionId: string;

  @ManyToOne(() => Construction, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'construction_id' })
  construction?: Relation<Construction>;

  @Column({ name: 'hose_batch', type: 'text', nullable: true })
  hoseBatch: string | null;

  @Column({ name: 'hose_manufactured_on', type: 'date', nullable: true })
  hoseManufacturedOn: string | null;

  @Column({ name: 'overall_length_mm', type: 'double precision', nullable: true })
  overallLengthMm: number | null;

  @Column({ name: 'cut_length_mm', type: 'double precision', nullable: true })
  cutLengthMm: number | null;

  @Column({ name: 'end_a_fitting_type_id', type: 'uuid', nullable: true })
  endAFittingTypeId: string | null;

  @ManyToOne(() => FittingType, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'end_a_fitting_type_id' })
  endAFittingType?: Relation<FittingType>;

  @Column({ name: 'end_b_fitting_type_id', type: 'uuid', nullable: true })
  endBFittingTypeId: string | null;

  @ManyToOne(() => FittingType, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'end_b_fitting_type_id' })
  endBFittingType?: Relation<FittingType>;

  @Column({ name: 'end_a_crimp_mm', type: 'double precision', nullable: true })
  endACrimpMm: number | null;

  @Column({ name: 'end_b_crimp_mm', type: 'double precision', nullable: true })
  endBCrimpMm: number | null;

  @Column({ name: 'built_on', type: 'date', nullable: true })
  builtOn: string | null;

  @Column({ name: 'built_on_estimated', type: 'boolean', default: false })
  builtOnEstimated: boolean;

  @Column({ type: 'text', nullable: true })
  builder: string | null;

  @Column({ name: 'cost', type: 'double precision', nullable: true })
  cost: number | null;

  @Column({ type: 'text' })
  status: AssemblyStatus;

  /** The site the assembly is at: its position's site when installed, else its stock site. */
  @Index('assemblies_site_id_idx')
  @Column({ name: 'site_id', type: 'uuid' })
  siteId: string;

  @Column({ name: 'store_location', type: 'text', nullable: true })
  storeLocation: string | null;

  @Column({ name: 'position_id', type: 'uuid', nullable: true })
  positionId: string | null;

  @ManyToOne(() => Position, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'position_id' })
  position?: Relation<Position>;

  @Column({ name: 'installed_at', type: 'timestamptz', nullable: true })
  installedAt: Date | null;

  @Column({ name: 'installed_at_estimated', type: 'boolean', default: false })
  installedAtEstimated: boolean;

  /** Installed before records began: its true age is unknown. */
  @Column({ name: 'predates_records', type: 'boolean', default: false })
  predatesRecords: boolean;

  @Column({ name: 'proof_test', type: 'jsonb', nullable: true })
  proofTest: ProofTestRecord | null;

  /** Worst outcome of the selection checks at the current position (null when not installed). */
  @Index('assemblies_check_outcome_idx')
  @Column({ name: 'check_outcome', type: 'text', nullable: true })
  checkOutcome: CheckOutcome | null;

  @Column({ name: 'check_results', type: 'jsonb', nullable: true })
  checkResults: CheckResult[] | null;

  @Column({ name: 'last_inspected_at', type: 'timestamptz', nullable: true })
  lastInspectedAt: Date | null;

  @Index('assemblies_next_inspection_due_idx')
  @Column({ name: 'next_inspection_due', type: 'date', nullable: true })
  nextInspectionDue: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @VersionColumn({ type: 'integer' })
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
