import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { Site } from './site.entity.js';

/** A service's settings at one site, starting from the catalogue's defaults. */
@Entity({ name: 'site_services' })
@Index('site_services_site_service_key', ['siteId', 'serviceCode'], { unique: true })
export class SiteService {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'site_id', type: 'uuid' })
  siteId: string;

  @ManyToOne(() => Site, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'site_id' })
  site?: Relation<Site>;

  @Column({ name: 'service_code', type: 'text' })
  serviceCode: string;

  @Column({ type: 'jsonb' })
  settings: ServiceSettings;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
