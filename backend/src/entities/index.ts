import { AppSetting } from './app-setting.entity.js';
import { Area } from './area.entity.js';
import { AssemblyEvent } from './assembly-event.entity.js';
import { Assembly } from './assembly.entity.js';
import { AttemptCounter } from './attempt-counter.entity.js';
import { AuditEntry } from './audit-entry.entity.js';
import { CheckOverride } from './check-override.entity.js';
import { Construction } from './construction.entity.js';
import { Equipment } from './equipment.entity.js';
import { FittingType } from './fitting-type.entity.js';
import { IdempotencyRecord } from './idempotency-record.entity.js';
import { ImportJob } from './import-job.entity.js';
import { LinkToken } from './link-token.entity.js';
import { Position } from './position.entity.js';
import { Session } from './session.entity.js';
import { SiteService } from './site-service.entity.js';
import { Site } from './site.entity.js';
import { User } from './user.entity.js';

export {
  AppSetting,
  Area,
  Assembly,
  AssemblyEvent,
  AttemptCounter,
  AuditEntry,
  CheckOverride,
  Construction,
  Equipment,
  FittingType,
  IdempotencyRecord,
  ImportJob,
  LinkToken,
  Position,
  Session,
  Site,
  SiteService,
  User,
};

export const ENTITIES = [
  AppSetting,
  Area,
  Assembly,
  AssemblyEvent,
  AttemptCounter,
  AuditEntry,
  CheckOverride,
  Construction,
  Equipment,
  FittingType,
  IdempotencyRecord,
  ImportJob,
  LinkToken,
  Position,
  Session,
  Site,
  SiteService,
  User,
];
