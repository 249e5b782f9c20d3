import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module.js';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { CycleJoinService } from './cycle-join.service.js';
import { LineupGateway } from './lineup.gateway.js';
import { SocketSessions } from './socket-sessions.service.js';

@Module({
  imports: [AuthModule, CycleChangesModule],
  providers: [LineupGateway, CycleJoinService, SocketSessions],
})
export class GatewayModule {}
