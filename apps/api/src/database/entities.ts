import { AuditEntry } from './entities/audit-entry.entity.js';
import { AircraftType } from './entities/aircraft-type.entity.js';
import { Aircraft } from './entities/aircraft.entity.js';
import { Cycle } from './entities/cycle.entity.js';
import { Upload } from './entities/upload.entity.js';
import { CycleChange } from './entities/cycle-change.entity.js';
import { Slot } from './entities/slot.entity.js';
import { OutboxMail } from './entities/outbox-mail.entity.js';
import { PasswordLink } from './entities/password-link.entity.js';
import { Catapult } from './entities/catapult.entity.js';
import { Ship } from './entities/ship.entity.js';
import { Squadron } from './entities/squadron.entity.js';
import { RefreshToken } from './entities/refresh-token.entity.js';
import { User } from './entities/user.entity.js';

/** Every entity, listed once for the app, the migration CLI and the tests. */
export const entities = [
  Aircraft,
  AircraftType,
  AuditEntry,
  Catapult,
  Cycle,
  CycleChange,
  OutboxMail,
  PasswordLink,
  RefreshToken,
  Ship,
  Slot,
  Squadron,
  Upload,
  User,
];
