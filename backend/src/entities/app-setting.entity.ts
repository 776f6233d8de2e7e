import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Installation-wide settings: company name, the one-time set-up token's hash. */
@Entity({ name: 'app_settings' })
export class AppSetting {
  @PrimaryColumn({ type: 'text' })
  key: string;

  @Column({ type: 'jsonb' })
  value: unknown;
}
