import { isCatapultRole, type Page, type UserView } from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { normalizeEmail } from '../auth/normalize-email.js';
import { hashPassword } from '../auth/password.js';
import { assertStrongPassword } from '../auth/password-strength.js';
import { RefreshTokens } from '../auth/refresh-tokens.service.js';
import { SessionEnds } from '../auth/session-ends.service.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { PasswordLinks } from '../password-links/password-links.service.js';
import { isDuplicateKey } from '../common/errors/database-errors.js';
import { pageOf, type PageWindow } from '../common/paging/page-query.dto.js';
import { type ShipScope, shipWhere } from '../common/ship-scope.js';
import { ownerShip } from '../ships/owner-ship.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import { Squadron } from '../database/entities/squadron.entity.js';
import { catapultBindingProblem } from './catapult-binding.js';
import type { CreateUserDto } from './dto/create-user.dto.js';
import type { UpdateUserDto } from './dto/update-user.dto.js';
import { User } from '../database/entities/user.entity.js';
import { toUserView } from './user.mapper.js';
import { UsersException } from './users.exception.js';

const noPerson = (id: number) => new UsersException('user_not_found', `There is no person with id ${id}.`);

@Injectable()
export class UsersService {
  private readonly logger = new Logger(UsersService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly refreshTokens: RefreshTokens,
    private readonly links: PasswordLinks,
    private readonly audit: AuditTrail,
    private readonly sessionEnds: SessionEnds,
  ) {}

  async list(scope: ShipScope, window: PageWindow): Promise<Page<UserView>> {
    const [users, total] = await this.dataSource.manager.findAndCount(User, {
      where: shipWhere(scope),
      order: { name: 'ASC', id: 'ASC' },
      take: window.limit,
      skip: window.offset,
    });
    return pageOf(window, users.map(toUserView), total);
  }

  async listPilots(scope: ShipScope, window: PageWindow): Promise<Page<UserView>> {
    const [pilots, total] = await this.dataSource.manager.findAndCount(User, {
      where: { role: 'pilot', active: true, ...shipWhere(scope) },
      order: { name: 'ASC', id: 'ASC' },
      take: window.limit,
      skip: window.offset,
    });
    return pageOf(window, pilots.map(toUserView), total);
  }

  async get(scope: ShipScope, id: number): Promise<UserView> {
    const user = await this.dataSource.manager.findOneBy(User, { id, ...shipWhere(scope) });
    if (!user) throw noPerson(id);
    return toUserView(user);
  }

  async create(actor: AuthenticatedUser, body: CreateUserDto): Promise<UserView> {
    const email = normalizeEmail(body.email);
    const manager = this.dataSource.manager;
    const shipId = await this.shipOfNew(manager, actor, body);
    const binding = {
      role: body.role,
      catapultId: body.catapultId ?? null,
      squadronId: body.squadronId ?? null,
      shipId,
    };
    await this.checkBinding(manager, binding);
    if (await manager.existsBy(User, { email })) throw this.emailTaken(email);
    if (body.password !== undefined) assertStrongPassword(body.password, { email, name: body.name });
    const passwordHash = body.password === undefined ? null : await hashPassword(body.password);
    try {
      // Without a password the person gets an invitation, queued in the same transaction.
      const user = await this.dataSource.transaction(async (writer) => {
        const saved = await writer.save(
          User,
          writer.create(User, { email, name: body.name, passwordHash, ...binding }),
        );
        if (passwordHash === null) await this.links.invite(writer, saved);
        await this.audit.record(writer, {
          action: 'person.created',
          subject: { type: 'person', id: saved.id },
          shipId: saved.shipId,
          summary: `${saved.name} added as ${saved.role}`,
          after: { ...toUserView(saved) },
        });
        return saved;
      });
      this.logger.log(`User ${user.id} (${user.role}) created${passwordHash === null ? ' and invited' : ''}`);
      return toUserView(user);
    } catch (error) {
      if (isDuplicateKey(error)) throw this.emailTaken(email);
      throw error;
    }
  }

  /**
   * A change of role, catapult or activity takes effect at once: the token version moves on, so tokens
   * signed before it stop working, and the person's sessions and sockets are ended.
   */
  async update(id: number, body: UpdateUserDto, actor: AuthenticatedUser): Promise<UserView> {
    let accessChanged = false;
    const view = await this.dataSource.transaction(async (manager) => {
      const user = await this.findOrFail(manager, actor, id);
      if (id === actor.id && ((body.role && body.role !== user.role) || body.active === false)) {
        throw new UsersException(
          'self_change',
          'You cannot change your own role or deactivate yourself; ask another admin.',
        );
      }
      const before = toUserView(user);
      const role = body.role ?? user.role;
      // Leaving a catapult role releases the catapult unless the request says otherwise.
      const catapultId =
        body.catapultId !== undefined ? body.catapultId : isCatapultRole(role) ? user.catapultId : null;
      const squadronId = body.squadronId !== undefined ? body.squadronId : user.squadronId;
      await this.checkBinding(manager, { role, catapultId, squadronId, shipId: user.shipId });

      const access =
        role !== user.role || catapultId !== user.catapultId || (body.active ?? user.active) !== user.active;
      Object.assign(user, {
        name: body.name ?? user.name,
        role,
        catapultId,
        squadronId,
        active: body.active ?? user.active,
      });
      if (access) user.tokenVersion += 1;
      accessChanged = access;
      await manager.save(User, user);
      if (!user.active) await this.refreshTokens.revokeAllFor(user.id, manager);
      const after = toUserView(user);
      await this.audit.record(manager, {
        action: 'person.updated',
        subject: { type: 'person', id },
        shipId: user.shipId,
        summary: `${user.name} changed`,
        before: { ...before },
        after: { ...after },
      });
      return after;
    });
    if (accessChanged) this.sessionEnds.tell({ personId: id });
    return view;
  }

  /** A fresh invitation link for an active person who has no password yet; returns the address it goes to. */
  async resendInvitation(scope: ShipScope, id: number): Promise<string> {
    return this.dataSource.transaction(async (manager) => {
      const user = await this.findOrFail(manager, scope, id);
      if (!user.active)
        throw new UsersException(
          'cannot_invite',
          `${user.name} is removed; reactivate them before inviting them again.`,
        );
      if (user.passwordHash !== null) {
        throw new UsersException(
          'cannot_invite',
          `${user.name} has already chosen a password; they can ask for a reset link on the sign-in page.`,
        );
      }
      await this.links.invite(manager, user);
      await this.audit.record(manager, {
        action: 'person.invited',
        subject: { type: 'person', id },
        shipId: user.shipId,
        summary: `Invitation sent again to ${user.name}`,
      });
      return user.email;
    });
  }

  /** Deactivates rather than erases: cycle records keep naming the person. Their sessions end at once. */
  async remove(id: number, actor: AuthenticatedUser): Promise<void> {
    if (id === actor.id) {
      throw new UsersException('self_change', 'You cannot remove your own account; ask another admin.');
    }
    await this.dataSource.transaction(async (manager) => {
      const user = await this.findOrFail(manager, actor, id);
      await manager.update(User, { id: user.id }, { active: false, tokenVersion: user.tokenVersion + 1 });
      await this.refreshTokens.revokeAllFor(user.id, manager);
      await this.audit.record(manager, {
        action: 'person.removed',
        subject: { type: 'person', id },
        shipId: user.shipId,
        summary: `${user.name} removed`,
        before: { active: user.active },
        after: { active: false },
      });
    });
    this.sessionEnds.tell({ personId: id });
    this.logger.log(`User ${id} removed by ${actor.id}`);
  }

  private async findOrFail(manager: EntityManager, scope: ShipScope, id: number): Promise<User> {
    const user = await manager.findOne(User, {
      where: { id, ...shipWhere(scope) },
      lock: { mode: 'pessimistic_write' },
    });
    if (!user) throw noPerson(id);
    return user;
  }

  /**
   * The ship of a person being added: as for any ship-owned row (ownerShip), except that a fleet admin
   * may add another fleet admin by sending `shipId: null`.
   */
  private async shipOfNew(
    manager: EntityManager,
    actor: AuthenticatedUser,
    body: CreateUserDto,
  ): Promise<number | null> {
    if (body.shipId === null && actor.shipId === null) return null;
    return ownerShip(manager, actor, body.shipId ?? undefined);
  }

  /** The catapult and squadron must be on the person's ship; only an admin may be without one. */
  private async checkBinding(
    manager: EntityManager,
    { role, catapultId, squadronId, shipId }: Pick<User, 'role' | 'catapultId' | 'squadronId' | 'shipId'>,
  ): Promise<void> {
    const problem =
      catapultBindingProblem(role, catapultId) ??
      (shipId === null && role !== 'admin'
        ? 'Only an admin can work for the whole fleet; give the person a ship.'
        : null);
    if (problem) throw new UsersException('invalid_binding', problem);
    const onShip = shipId === null ? {} : { shipId };
    if (catapultId !== null && !(await manager.existsBy(Catapult, { id: catapultId, ...onShip }))) {
      throw new UsersException('unknown_reference', `There is no catapult with id ${catapultId}.`);
    }
    if (squadronId !== null && !(await manager.existsBy(Squadron, { id: squadronId, ...onShip }))) {
      throw new UsersException('unknown_reference', `There is no squadron with id ${squadronId}.`);
    }
  }

  private emailTaken(email: string): UsersException {
    return new UsersException(
      'email_taken',
      `Someone already signs in with ${email} (active or removed); use another e-mail or reactivate them.`,
    );
  }
}
