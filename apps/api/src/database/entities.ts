import { AircraftType } from '../aircraft-types/entities/aircraft-type.entity.js';
import { Aircraft } from '../aircraft/entities/aircraft.entity.js';
import { Cycle } from '../cycles/entities/cycle.entity.js';
import { Upload } from '../imports/entities/upload.entity.js';
import { CycleChange } from '../cycle-changes/entities/cycle-change.entity.js';
import { Slot } from '../cycle-changes/entities/slot.entity.js';
import { OutboxMail } from '../mail/entities/outbox-mail.entity.js';
import { PasswordLink } from '../password-links/entities/password-link.entity.js';
import { Catapult } from '../ships/entities/catapult.entity.js';
import { Ship } from '../ships/entities/ship.entity.js';
import { Squadron } from '../squadrons/entities/squadron.entity.js';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { User } from '../users/entities/user.entity.js';

/** Every entity, listed once for the app, the migration CLI and the tests. */
export const entities = [
  Aircraft,
  AircraftType,
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
