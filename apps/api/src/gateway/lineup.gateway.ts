import { changesCycleList, ROLES, type JoinCycleResult, type RefreshSocketResult } from '@catline/contracts';
import { Logger, type OnModuleDestroy, UseFilters, UseGuards, UsePipes, ValidationPipe } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import {
  Ack,
  ConnectedSocket,
  MessageBody,
  type OnGatewayInit,
  SubscribeMessage,
  WebSocketGateway,
} from '@nestjs/websockets';
import { CycleScope } from '../auth/cycle-scope.service.js';
import { SessionEnds } from '../auth/session-ends.service.js';
import { TokenVerifier } from '../auth/token-verifier.service.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { type Environment, runsClustered, webOrigins } from '../config/environment.js';
import { LineupChangeFeed } from '../cycle-changes/change-feed.service.js';
import { CycleJoinService } from './cycle-join.service.js';
import { JoinCycleDto } from './dto/join-cycle.dto.js';
import { LeaveCycleDto } from './dto/leave-cycle.dto.js';
import { RefreshSessionDto } from './dto/refresh-session.dto.js';
import { socketHandshake } from './socket-handshake.js';
import { SocketExceptionFilter } from './socket-exception.filter.js';
import { SocketRefusal } from './socket-refusal.js';
import { SocketRolesGuard } from './socket-roles.guard.js';
import { SocketSessions } from './socket-sessions.service.js';
import { cycleRoom, shipRoom, type CatlineServer, type CatlineSocket } from './socket.types.js';

/**
 * The live lineup: one room per cycle. Clients only listen and join; every change arrives through
 * the REST commands and is broadcast here, after its commit, in version order. With REDIS_URL the
 * rooms span every API process: each process broadcasts the changes it committed, right away. A change
 * a list of cycles shows also sends the cycle to the rooms of its ship and of the fleet.
 */
@WebSocketGateway({ serveClient: false })
@UseGuards(SocketRolesGuard)
@UseFilters(SocketExceptionFilter)
@UsePipes(new ValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true }))
export class LineupGateway implements OnGatewayInit<CatlineServer>, OnModuleDestroy {
  private readonly logger = new Logger(LineupGateway.name);
  private readonly unsubscribe: Array<() => void> = [];

  constructor(
    private readonly verifier: TokenVerifier,
    private readonly sessions: SocketSessions,
    private readonly sessionEnds: SessionEnds,
    private readonly feed: LineupChangeFeed,
    private readonly joins: CycleJoinService,
    private readonly cycleScope: CycleScope,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  afterInit(server: CatlineServer): void {
    server.use(
      socketHandshake(this.verifier, this.sessions, webOrigins({ WEB_ORIGINS: this.config.get('WEB_ORIGINS') })),
    );
    const clustered = runsClustered({ REDIS_URL: this.config.get('REDIS_URL', { infer: true }) });
    if (clustered)
      server.on('lineup:committed', (cycleId, version) => this.feed.noteCommittedElsewhere(cycleId, version));
    this.unsubscribe.push(this.sessionEnds.subscribe((ended) => this.sessions.end(server, ended)));
    this.unsubscribe.push(
      this.feed.subscribe((change) => {
        // Sent ahead of the broadcast on the same Redis connection, so another process learns of the version
        // before its sockets get it: a socket joining there meanwhile re-reads the log instead of missing it.
        if (clustered) server.serverSideEmit('lineup:committed', change.cycleId, change.version);
        server.to(cycleRoom(change.cycleId)).emit('lineup:change', change);
        const cycle = change.patch.cycle;
        if (cycle && changesCycleList(change.kind))
          server.to([shipRoom(cycle.shipId), shipRoom(null)]).emit('cycle:status', cycle);
      }),
    );
    this.logger.log('Lineup socket ready');
  }

  onModuleDestroy(): void {
    for (const unsubscribe of this.unsubscribe) unsubscribe();
  }

  /**
   * Answers with a snapshot, or with the changes after `sinceVersion` when the change log still holds them.
   * The guard has just checked the person again (removed, role or password changed, logged out); a cycle
   * of another ship is answered as one that does not exist.
   */
  @Roles(...ROLES)
  @SubscribeMessage('cycle:join')
  async join(
    @ConnectedSocket() socket: CatlineSocket,
    @MessageBody() request: JoinCycleDto,
    @Ack() ack: (result: JoinCycleResult) => void,
  ): Promise<void> {
    if (typeof ack !== 'function')
      throw new SocketRefusal('ack_required', 'cycle:join must be sent with an acknowledgement.');
    await this.cycleScope.check(socket.data.user!, request.cycleId);
    await this.joins.join(request, { enter: () => void socket.join(cycleRoom(request.cycleId)), answer: ack });
  }

  @Roles(...ROLES)
  @SubscribeMessage('cycle:leave')
  async leave(
    @ConnectedSocket() socket: CatlineSocket,
    @MessageBody() request: LeaveCycleDto,
  ): Promise<{ ok: boolean }> {
    await socket.leave(cycleRoom(request.cycleId));
    return { ok: true };
  }

  /** A new access token for the same person keeps the socket open past the old token's expiry. */
  @Roles(...ROLES)
  @SubscribeMessage('session:refresh')
  async refresh(
    @ConnectedSocket() socket: CatlineSocket,
    @MessageBody() request: RefreshSessionDto,
  ): Promise<RefreshSocketResult> {
    const session = await this.verifier.verifySession(request.accessToken).catch(() => null);
    if (!session) return { ok: false, message: 'That token is not valid; sign in again.' };
    if (session.user.id !== socket.data.user?.id) return { ok: false, message: 'That token belongs to someone else.' };
    this.sessions.renew(socket, session);
    return { ok: true, expiresAt: session.expiresAt.toISOString() };
  }
}
