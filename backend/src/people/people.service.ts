import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { SessionUser } from '../auth/session-user.js';
import { hashPassword, temporaryPassword } from '../auth/password.js';
import { PeopleRepository } from './people.repository.js';
import { toPersonResponse, type PersonResponse } from './person.mapper.js';
import type { CreatePersonDto } from './dto/create-person.dto.js';
import type { UpdatePersonDto } from './dto/update-person.dto.js';

@Injectable()
export class PeopleService {
  constructor(private readonly repo: PeopleRepository) {}

  async list(actor: SessionUser): Promise<PersonResponse[]> {
    return (await this.repo.list(actor.workshopId)).map(toPersonResponse);
  }

  async add(actor: SessionUser, dto: CreatePersonDto) {
    const email = dto.email.trim();
    if (await this.repo.emailTaken(email)) throw new ConflictException(`${email} already has an account`);
    const password = temporaryPassword();
    const row = await this.repo.insert(actor.workshopId, {
      name: dto.name.trim(),
      email,
      role: dto.role,
      passwordHash: await hashPassword(password),
    });
    return { person: toPersonResponse(row), temporaryPassword: password };
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
