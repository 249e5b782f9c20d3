import { Global, Module } from '@nestjs/common';
import { AuditController } from './audit.controller.js';
import { AuditLog } from './audit-log.service.js';
import { AuditTrail } from './audit-trail.service.js';

/** Global, so any feature records its changes with AuditTrail without listing this module. */
@Global()
@Module({ controllers: [AuditController], providers: [AuditTrail, AuditLog], exports: [AuditTrail] })
export class AuditModule {}
