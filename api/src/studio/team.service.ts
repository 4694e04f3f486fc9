import { createHash, randomBytes, randomUUID } from 'node:crypto';
import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { Role } from '@nappe/shared';
import { DataSource, In, IsNull, MoreThan, type EntityManager } from 'typeorm';
import { AuthService, type IssuedSession } from '../auth/auth.service.js';
import { PasswordService } from '../auth/password.service.js';
import { isGuessablePassword, WEAK_PASSWORD_MESSAGE } from '../auth/password-strength.js';
import { Clock } from '../common/clock.js';
import { Env } from '../config/env.js';
import { OutboxService } from '../mail/outbox.service.js';
import { User } from '../users/entities/user.entity.js';
import { StaffInvitationEntity } from './entities/staff-invitation.entity.js';
import { StudioSettings } from './entities/studio-settings.entity.js';
import { invitationMail } from './team-mail.js';
import type {
  AcceptInvitationBody,
  InvitationBody,
  InvitationView,
  RoleChangeBody,
  TeamMemberView,
} from './team.bodies.js';
import { lockFor, lockKey } from '../database/serialized-writes.js';

/** How long an invitation link works. */
export const INVITATION_TTL_DAYS = 7;

const sha256 = (value: string): string => createHash('sha256').update(value).digest('hex');

const isTeamRole = (role: Role): role is Role.Staff | Role.Chef =>
  role === Role.Staff || role === Role.Chef;

/** Why a link cannot be used, in words the invitee can act on. */
function unusableReason(inv: StaffInvitationEntity | null, now: Date): string | null {
  if (!inv) return 'This invitation link is not valid. Ask the chef for a new one.';
  if (inv.acceptedAt)
    return 'This invitation has already been used. Sign in with the password you chose, or ask the chef for a new one.';
  if (inv.revokedAt) return 'This invitation was withdrawn by the chef. Ask them for a new one.';
  if (inv.expiresAt <= now)
    return `This invitation has expired (links work for ${INVITATION_TTL_DAYS} days). Ask the chef for a new one.`;
  return null;
}

/**
 * The studio's team: invitations by e-mail with a one-time link, roles, and removal. A role
 * change applies on the member's next request (the JWT strategy reloads the user each time);
 * removal ends every session at once.
 */
@Injectable()
export class TeamService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly env: Env,
    private readonly outbox: OutboxService,
    private readonly passwords: PasswordService,
    private readonly auth: AuthService,
  ) {}

  // ---------------------------------------------------------------- invitations

  async invite(chefId: string, body: InvitationBody): Promise<InvitationView> {
    const token = randomBytes(32).toString('base64url');
    return this.dataSource.transaction(async (m) => {
      const existing = await m.findOneBy(User, { email: body.email });
      if (existing && !existing.removedAt) {
        throw new ConflictException(
          existing.role === Role.Client
            ? 'This e-mail belongs to a client account. Invite the team member with another address.'
            : 'This person is already on the team.',
        );
      }
      const now = this.clock.now();
      // A new invitation to the same address replaces any pending one: only the newest link works.
      await m.update(
        StaffInvitationEntity,
        { email: body.email, acceptedAt: IsNull(), revokedAt: IsNull() },
        { revokedAt: now },
      );
      const invitation = m.create(StaffInvitationEntity, {
        id: randomUUID(),
        email: body.email,
        name: body.name,
        role: body.role,
        tokenHash: sha256(token),
        invitedById: chefId,
        expiresAt: new Date(now.getTime() + INVITATION_TTL_DAYS * 86_400_000),
        acceptedAt: null,
        acceptedUserId: null,
        revokedAt: null,
        createdAt: now,
      });
      await m.insert(StaffInvitationEntity, invitation);
      const studio = await m.findOneByOrFail(StudioSettings, { id: 1 });
      const chef = await m.findOneByOrFail(User, { id: chefId });
      const link = `${this.env.PUBLIC_ADMIN_URL.replace(/\/+$/, '')}/accept-invitation?token=${token}`;
      await this.outbox.enqueue(m, {
        kind: 'staff_invitation',
        orderId: null,
        to: body.email,
        content: invitationMail({
          studioName: studio.name,
          inviteeName: body.name,
          inviterName: chef.name,
          role: body.role,
          link,
          expiresAt: invitation.expiresAt,
        }),
      });
      return this.viewOf(invitation, chef.name);
    });
  }

  /** Invitations not yet used, withdrawn or expired, newest first. */
  pending(): Promise<InvitationView[]> {
    return this.dataSource.transaction(async (m) => {
      const rows = await m.find(StaffInvitationEntity, {
        where: { acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(this.clock.now()) },
        order: { createdAt: 'DESC', id: 'ASC' },
        take: 200,
      });
      const inviterIds = [...new Set(rows.map((r) => r.invitedById))];
      const inviters = inviterIds.length === 0 ? [] : await m.findBy(User, { id: In(inviterIds) });
      const names = new Map(inviters.map((u) => [u.id, u.name]));
      return rows.map((r) => this.viewOf(r, names.get(r.invitedById) ?? ''));
    });
  }

  async revoke(id: string): Promise<void> {
    await this.dataSource.transaction(async (m) => {
      const inv = await m.findOneBy(StaffInvitationEntity, { id });
      if (!inv || inv.acceptedAt || inv.revokedAt)
        throw new NotFoundException('No pending invitation with this id.');
      await m.update(StaffInvitationEntity, { id }, { revokedAt: this.clock.now() });
    });
  }

  async accept(body: AcceptInvitationBody): Promise<IssuedSession> {
    const tokenHash = sha256(body.token);
    const found = await this.dataSource
      .getRepository(StaffInvitationEntity)
      .findOneBy({ tokenHash });
    const problem = unusableReason(found, this.clock.now());
    if (problem || !found) throw new BadRequestException([problem]);
    if (isGuessablePassword(body.password, { email: found.email, name: body.name })) {
      throw new BadRequestException([WEAK_PASSWORD_MESSAGE]);
    }
    // Hash before taking the connection: never hold the database during slow work.
    const passwordHash = await this.passwords.hash(body.password);
    const user = await this.dataSource.transaction(async (m) => {
      const now = this.clock.now();
      // Checked again inside the transaction: two tabs submitting the same link, one wins (on
      // PostgreSQL the second waits on the invitation's row, then finds it used).
      await lockFor(
        m,
        { row: StaffInvitationEntity, id: found.id },
        lockKey('account-email', found.email),
      );
      const inv = await m.findOneBy(StaffInvitationEntity, { tokenHash });
      const again = unusableReason(inv, now);
      if (again || !inv) throw new BadRequestException([again]);
      const existing = await m.findOneBy(User, { email: inv.email });
      if (existing && !existing.removedAt)
        throw new ConflictException('An account with this e-mail already exists. Sign in instead.');
      let account: User;
      if (existing) {
        // A removed member invited back: the same account (and its history) comes back.
        await m.update(
          User,
          { id: existing.id },
          { name: body.name, passwordHash, role: inv.role as Role, removedAt: null },
        );
        account = await m.findOneByOrFail(User, { id: existing.id });
      } else {
        account = await m.save(
          m.create(User, {
            email: inv.email,
            name: body.name,
            passwordHash,
            role: inv.role as Role,
            removedAt: null,
          }),
        );
      }
      await m.update(
        StaffInvitationEntity,
        { id: inv.id },
        { acceptedAt: now, acceptedUserId: account.id },
      );
      return account;
    });
    return this.auth.signInVerified(user);
  }

  // ---------------------------------------------------------------- members

  async changeRole(id: string, body: RoleChangeBody): Promise<TeamMemberView> {
    return this.dataSource.transaction(async (m) => {
      const user = await this.member(m, id);
      if (user.role !== body.role) {
        if (user.role === Role.Chef) await this.keepOneChef(m, 'change this chef’s role');
        await m.update(User, { id }, { role: body.role as Role });
      }
      return this.memberView(await m.findOneByOrFail(User, { id }));
    });
  }

  /** `actorId`: the chef asking. Nobody removes their own account here (another chef can). */
  async remove(id: string, actorId: string): Promise<void> {
    await this.dataSource.transaction(async (m) => {
      const user = await this.member(m, id);
      if (user.id === actorId) {
        throw new ConflictException(
          'You cannot remove your own account. Another chef can remove it, if that is what you want.',
        );
      }
      if (user.role === Role.Chef) await this.keepOneChef(m, 'remove this chef');
      const now = this.clock.now();
      await m.update(User, { id }, { removedAt: now });
      await this.auth.revokeAllSessions(m, id, 'removed', now);
    });
  }

  private async member(m: EntityManager, id: string): Promise<User> {
    const user = await m.findOneBy(User, { id, removedAt: IsNull() });
    if (!user) throw new NotFoundException('No team member with this id.');
    if (!isTeamRole(user.role)) {
      throw new ConflictException(
        'This is a client account, not a team member: its role cannot be changed here, and only the client can close it.',
      );
    }
    return user;
  }

  private async keepOneChef(m: EntityManager, action: string): Promise<void> {
    const chefs = await m.countBy(User, { role: Role.Chef, removedAt: IsNull() });
    if (chefs <= 1) {
      throw new ConflictException(
        `You cannot ${action}: the studio needs at least one chef. Invite or promote another chef first.`,
      );
    }
  }

  private memberView(user: User): TeamMemberView {
    return { id: user.id, email: user.email, name: user.name, role: user.role as 'staff' | 'chef' };
  }

  private viewOf(r: StaffInvitationEntity, invitedBy: string): InvitationView {
    return {
      id: r.id,
      email: r.email,
      name: r.name,
      role: r.role,
      invitedBy,
      createdAt: r.createdAt.toISOString(),
      expiresAt: r.expiresAt.toISOString(),
    };
  }
}
