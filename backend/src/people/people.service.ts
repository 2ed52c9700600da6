import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { AuthService } from '../auth/auth.service.js';
import type { SessionUser } from '../auth/session-user.js';
import { hashPassword, temporaryPassword } from '../auth/password.js';
import { passwordResetMail } from '../auth/password-links.mails.js';
import { LINK_HOURS, PasswordLinksService } from '../auth/password-links.service.js';
import { MailService } from '../mail/mail.service.js';
import { RecordsService } from '../records/records.service.js';
import { invitationMail } from './invitation-mail.js';
import { PeopleRepository } from './people.repository.js';
import { toPersonResponse, type PersonResponse, type PersonRow } from './person.mapper.js';
import { ROLE_NAMES } from './role-words.js';
import type { CreatePersonDto } from './dto/create-person.dto.js';
import type { UpdatePersonDto } from './dto/update-person.dto.js';

/**
 * Members of the workshop. Nobody can choose or learn another person's password: a link to
 * choose one goes by mail to that person alone — an invitation while they have never had one,
 * a reset (which signs them out everywhere) once they have.
 */
@Injectable()
export class PeopleService {
  constructor(
    private readonly repo: PeopleRepository,
    private readonly links: PasswordLinksService,
    private readonly mail: MailService,
    private readonly auth: AuthService,
    private readonly records: RecordsService,
  ) {}

  async list(actor: SessionUser): Promise<PersonResponse[]> {
    return (await this.repo.list(actor.workshopId)).map(toPersonResponse);
  }

  /** A new member gets an e-mail with a set-your-password link; until they use it their account has a random password nobody knows. */
  async add(actor: SessionUser, dto: CreatePersonDto) {
    const email = dto.email.trim();
    if (await this.repo.emailTaken(email)) throw new ConflictException(`${email} already has an account`);
    const row = await this.repo.insert(actor.workshopId, {
      name: dto.name.trim(),
      email,
      role: dto.role,
      passwordHash: await hashPassword(temporaryPassword()),
      passwordPending: true,
    });
    await this.records.audit(actor, {
      recordType: 'person',
      recordId: row.id,
      action: 'created',
      summary: `${actor.name} added ${row.name} as ${ROLE_NAMES[row.role]}`,
    });
    return { person: toPersonResponse(row), ...(await this.invite(actor, row)) };
  }

  /** A fresh invitation, only for a member who has never chosen a password. */
  async resendInvitation(actor: SessionUser, id: string) {
    const row = await this.found(actor, id);
    if (!row.active) throw new ConflictException('This member is deactivated: activate them first');
    if (!row.passwordPending) {
      throw new ConflictException(
        `${row.name} has already chosen a password. Send them a password reset instead: the link goes to their own e-mail.`,
      );
    }
    return this.invite(actor, row);
  }

  /**
   * Resets an existing member's password: the old one stops working, every session of theirs
   * ends, and a link to choose a new one goes to their own e-mail only.
   */
  async resetPassword(actor: SessionUser, id: string) {
    const row = await this.found(actor, id);
    if (!row.active) throw new ConflictException('This member is deactivated: activate them first');
    await this.repo.setPasswordHash(row.id, await hashPassword(temporaryPassword()));
    await this.auth.endSessions(row.id);
    const link = await this.links.create(row.id, 'reset');
    await this.records.audit(actor, {
      recordType: 'password',
      recordId: row.id,
      action: 'password-reset',
      summary: `${actor.name} reset the password of ${row.name}: their sessions were ended and a link to choose a new one was e-mailed to them`,
    });
    const { subject, text } = passwordResetMail({
      name: row.name,
      workshopName: actor.workshopName,
      resetBy: actor.name,
      url: link.url,
      hours: LINK_HOURS,
    });
    const sent = await this.mail.send({ workshopId: actor.workshopId, to: [row.email], subject, text });
    return { resetSent: sent, resetExpiresAt: link.expiresAt.toISOString() };
  }

  async update(actor: SessionUser, id: string, dto: UpdatePersonDto): Promise<PersonResponse> {
    const current = await this.found(actor, id);
    const losesAdmin =
      current.role === 'admin' && current.active && (dto.active === false || (dto.role && dto.role !== 'admin'));
    if (losesAdmin && (await this.repo.countOtherActiveAdmins(actor.workshopId, id)) === 0) {
      throw new ConflictException('The workshop needs at least one active admin: make someone else admin first');
    }
    const row = await this.repo.update(actor.workshopId, id, dto);
    this.auth.personChanged(id);
    // Deactivation signs them out everywhere; reactivation starts from no session at all.
    if (dto.active !== undefined && dto.active !== current.active) await this.auth.endSessions(id);
    const said: string[] = [];
    if (dto.role && dto.role !== current.role)
      said.push(`changed the role of ${row.name} from ${ROLE_NAMES[current.role]} to ${ROLE_NAMES[row.role]}`);
    if (dto.active === false && current.active) said.push(`deactivated ${row.name} (signed out everywhere)`);
    if (dto.active === true && !current.active) said.push(`reactivated ${row.name}`);
    if (said.length) {
      await this.records.audit(actor, {
        recordType: 'person',
        recordId: id,
        action: 'updated',
        summary: `${actor.name} ${said.join(' and ')}`,
      });
    }
    return toPersonResponse(row);
  }

  private async found(actor: SessionUser, id: string): Promise<PersonRow> {
    const row = await this.repo.find(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such member in this workshop');
    return row;
  }

  /** Mails the invitation; the link goes to the person only and never back to the admin. */
  private async invite(
    actor: SessionUser,
    person: { id: string; name: string; email: string; role: PersonResponse['role'] },
  ) {
    const link = await this.links.create(person.id, 'invitation');
    const { subject, text } = invitationMail({
      name: person.name,
      role: person.role,
      workshopName: actor.workshopName,
      invitedBy: actor.name,
      url: link.url,
      hours: LINK_HOURS,
    });
    const sent = await this.mail.send({ workshopId: actor.workshopId, to: [person.email], subject, text });
    await this.records.audit(actor, {
      recordType: 'person',
      recordId: person.id,
      action: 'invited',
      summary: `${actor.name} e-mailed ${person.name} an invitation to choose a password`,
    });
    return { invitationSent: sent, invitationExpiresAt: link.expiresAt.toISOString() };
  }
}
