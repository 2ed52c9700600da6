import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { hashPassword, temporaryPassword } from '../auth/password.js';
import { LINK_HOURS, PasswordLinksService } from '../auth/password-links.service.js';
import { MailService } from '../mail/mail.service.js';
import { invitationMail } from './invitation-mail.js';
import { PeopleRepository } from './people.repository.js';
import { toPersonResponse, type PersonResponse } from './person.mapper.js';
import type { CreatePersonDto } from './dto/create-person.dto.js';
import type { UpdatePersonDto } from './dto/update-person.dto.js';

@Injectable()
export class PeopleService {
  constructor(
    private readonly repo: PeopleRepository,
    private readonly links: PasswordLinksService,
    private readonly mail: MailService,
  ) {}

  async list(actor: SessionUser): Promise<PersonResponse[]> {
    return (await this.repo.list(actor.workshopId)).map(toPersonResponse);
  }

  /**
   * A new member gets an e-mail with a set-your-password link; until they use it their account
   * has a random password nobody knows. If the mail cannot be sent the admin is given the link.
   */
  async add(actor: SessionUser, dto: CreatePersonDto) {
    const email = dto.email.trim();
    if (await this.repo.emailTaken(email)) throw new ConflictException(`${email} already has an account`);
    const row = await this.repo.insert(actor.workshopId, {
      name: dto.name.trim(),
      email,
      role: dto.role,
      passwordHash: await hashPassword(temporaryPassword()),
    });
    return { person: toPersonResponse(row), ...(await this.invite(actor, row)) };
  }

  /** A fresh link for a member who lost or let theirs expire. */
  async resendInvitation(actor: SessionUser, id: string) {
    const row = await this.repo.find(actor.workshopId, id);
    if (!row) throw new NotFoundException('No such member in this workshop');
    if (!row.active) throw new ConflictException('This member is deactivated: activate them first');
    return this.invite(actor, row);
  }

  private async invite(actor: SessionUser, person: { id: string; name: string; email: string; role: PersonResponse['role'] }) {
    const link = await this.links.create(person.id, 'invitation');
    const { subject, text } = invitationMail({ name: person.name, role: person.role, workshopName: actor.workshopName, invitedBy: actor.name, url: link.url, hours: LINK_HOURS });
    const sent = await this.mail.send({ workshopId: actor.workshopId, to: [person.email], subject, text });
    return sent
      ? { invitationSent: true, invitationExpiresAt: link.expiresAt.toISOString() }
      : { invitationSent: false, invitationExpiresAt: link.expiresAt.toISOString(), invitationLink: link.url };
  }

  async update(actor: SessionUser, id: string, dto: UpdatePersonDto): Promise<PersonResponse> {
    const current = await this.repo.find(actor.workshopId, id);
    if (!current) throw new NotFoundException('No such member in this workshop');
    const losesAdmin = current.role === 'admin' && current.active && (dto.active === false || (dto.role && dto.role !== 'admin'));
    if (losesAdmin && (await this.repo.countOtherActiveAdmins(actor.workshopId, id)) === 0) {
      throw new ConflictException('The workshop needs at least one active admin: make someone else admin first');
    }
    return toPersonResponse(await this.repo.update(actor.workshopId, id, dto));
  }
}
