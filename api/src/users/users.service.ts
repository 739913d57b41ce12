import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { hashPassword } from '../auth/password.js';
import type { AuthUser } from '../common/roles.js';
import { isUniqueViolation } from '../common/unique-violation.js';
import type { CreateUserDto } from './dto/create-user.dto.js';
import { UsersRepository, type UserSummary } from './users.repository.js';

function emailTaken(): ConflictException {
  return new ConflictException({ message: 'That e-mail address already has an account', fields: [{ field: 'email', message: 'already in use' }] });
}

@Injectable()
export class UsersService {
  constructor(private readonly users: UsersRepository) {}

  list(actor: AuthUser): Promise<UserSummary[]> {
    return this.users.listInOrganisation(actor.organisationId);
  }

  async get(actor: AuthUser, id: string): Promise<UserSummary> {
    const user = await this.users.findInOrganisation(actor.organisationId, id);
    if (!user) throw new NotFoundException('No such user');
    return user;
  }

  async create(actor: AuthUser, dto: CreateUserDto): Promise<UserSummary> {
    if (await this.users.emailTaken(dto.email)) throw emailTaken();
    try {
      return await this.users.create({
        organisation_id: actor.organisationId,
        email: dto.email.trim(),
        name: dto.name.trim(),
        role: dto.role,
        password_hash: await hashPassword(dto.password),
      });
    } catch (error) {
      // Two requests for one address at once both pass the check above; the index decides.
      if (isUniqueViolation(error, 'users_email_unique')) throw emailTaken();
      throw error;
    }
  }
}
