import { AppSetting } from './app-setting.entity.js';
import { AttemptCounter } from './attempt-counter.entity.js';
import { AuditEntry } from './audit-entry.entity.js';
import { LinkToken } from './link-token.entity.js';
import { Session } from './session.entity.js';
import { Site } from './site.entity.js';
import { User } from './user.entity.js';

export { AppSetting, AttemptCounter, AuditEntry, LinkToken, Session, Site, User };

export const ENTITIES = [AppSetting, AttemptCounter, AuditEntry, LinkToken, Session, Site, User];
