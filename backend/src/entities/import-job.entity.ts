import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export type ImportKind = 'constructions' | 'positions' | 'assemblies';
export type ImportStatus = 'checking' | 'checked' | 'writing' | 'done' | 'failed';

/** One problem in an uploaded file: the row (1 = first data row), the column, what is wrong. */
export interface ImportProblem {
  row: number;
  column: string | null;
  message: string;
}

/**
 * A CSV import: the uploaded file, its check (every problem by row and column) and its write.
 * Progress is kept here so it survives a page reload and any server instance can answer for it.
 */
@Entity({ name: 'import_jobs' })
export class ImportJob {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('import_jobs_user_id_idx')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ type: 'text' })
  kind: ImportKind;

  /** The site rows go to, for positions and assemblies. */
  @Column({ name: 'site_id', type: 'uuid', nullable: true })
  siteId: string | null;

  @Column({ name: 'file_name', type: 'text' })
  fileName: string;

  @Column({ name: 'file_bytes', type: 'integer' })
  fileBytes: number;

  /** The file as uploaded (UTF-8 text), kept until it is written. */
  @Column({ type: 'text' })
  content: string;

  @Column({ type: 'text' })
  status: ImportStatus;

  @Column({ name: 'total_rows', type: 'integer', default: 0 })
  totalRows: number;

  @Column({ name: 'processed_rows', type: 'integer', default: 0 })
  processedRows: number;

  @Column({ name: 'error_count', type: 'integer', default: 0 })
  errorCount: number;

  /** The first problems found (capped), by row and column. */
  @Column({ type: 'jsonb', default: () => "'[]'" })
  problems: ImportProblem[];

  /** The first rows as they will be written, for the preview. */
  @Column({ type: 'jsonb', default: () => "'[]'" })
  preview: Array<Record<string, unknown>>;

  @Column({ name: 'written_rows', type: 'integer', default: 0 })
  writtenRows: number;

  @Column({ type: 'text', nullable: true })
  message: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;

  @Column({ name: 'finished_at', type: 'timestamptz', nullable: true })
  finishedAt: Date | null;
}
