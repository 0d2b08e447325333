import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, Repository } from 'typeorm';
import type { Page, UserDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import type { ListUsersQuery, UpdateUserDto } from './dto/admin-users.dto';
import { User } from './entities/user.entity';
import { toUserDto } from './users.mapper';

@Injectable()
export class UsersService {
  constructor(@InjectRepository(User) private readonly users: Repository<User>) {}

  async list(query: ListUsersQuery): Promise<Page<UserDto>> {
    const qb = this.users.createQueryBuilder('u').leftJoinAndSelect('u.shop', 'shop');
    if (query.q) {
      const q = `%${query.q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      qb.andWhere(new Brackets((w) => w.where("u.emailNormalized LIKE :q ESCAPE '\\'", { q }).orWhere("LOWER(u.displayName) LIKE :q ESCAPE '\\'", { q })));
    }
    if (query.role) qb.andWhere('u.role = :role', { role: query.role });
    qb.orderBy(`u.${query.sort}`, query.order === 'asc' ? 'ASC' : 'DESC').addOrderBy('u.id', 'ASC');
    qb.skip((query.page - 1) * query.pageSize).take(query.pageSize);
    const [rows, total] = await qb.getManyAndCount();
    return { items: rows.map(toUserDto), total, page: query.page, pageSize: query.pageSize };
  }

  async update(admin: AuthUser, id: string, dto: UpdateUserDto): Promise<UserDto> {
    const user = await this.users.findOne({ where: { id }, relations: { shop: true } });
    if (!user) throw new NotFoundException('User not found');
    if (user.id === admin.id && (dto.disabled === true || (dto.role && dto.role !== 'admin'))) {
      throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: 'You cannot disable yourself or give up your own admin role', errors: [{ field: dto.disabled ? 'disabled' : 'role', message: 'cannot be changed on your own account' }] });
    }
    if (dto.role !== undefined) user.role = dto.role;
    if (dto.disabled !== undefined && dto.disabled !== user.disabled) {
      user.disabled = dto.disabled;
      // Disabling revokes every token already issued.
      user.tokenVersion += 1;
    }
    return toUserDto(await this.users.save(user));
  }
}
