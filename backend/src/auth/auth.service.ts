import { BadRequestException, ConflictException, ForbiddenException, Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import * as bcrypt from 'bcryptjs';
import { DataSource, IsNull, Repository } from 'typeorm';
import type { AuthResponse, UserDto } from '@causeway/shared';
import { authConfig, type AuthConfig } from '../config/configuration';
import { validationFailed } from '../common/validation';
import { Invite } from '../shops/entities/invite.entity';
import { Shop } from '../shops/entities/shop.entity';
import { User } from '../users/entities/user.entity';
import { toUserDto } from '../users/users.mapper';
import type { JwtPayload } from './auth-user';
import type { ChangePasswordDto, LoginDto, RegisterDto } from './dto/auth.dto';
import { SignInLockout } from './sign-in-lockout';

const SIGN_IN_FAILED = 'The e-mail address or password is not right';

@Injectable()
export class AuthService {
  /** Compared against when the e-mail is unknown, so both answers take about as long. */
  private readonly dummyHash: string;

  constructor(
    @Inject(authConfig.KEY) private readonly config: AuthConfig,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jwt: JwtService,
    private readonly lockout: SignInLockout,
  ) {
    this.dummyHash = bcrypt.hashSync('causeway-timing-equaliser', config.bcryptRounds);
  }

  hashPassword(password: string): Promise<string> {
    return bcrypt.hash(password, this.config.bcryptRounds);
  }

  async register(dto: RegisterDto): Promise<AuthResponse> {
    if (!!dto.inviteCode === !!dto.shop) {
      throw validationFailed([{ field: dto.shop ? 'inviteCode' : 'shop', message: 'give either an invite code to join a shop or the details of a new shop, not both and not neither' }]);
    }
    const emailNormalized = dto.email.toLowerCase();
    const passwordHash = await this.hashPassword(dto.password);
    const userId = await this.dataSource.transaction(async (em) => {
      if (await em.exists(User, { where: { emailNormalized } })) {
        throw new ConflictException({ statusCode: 409, error: 'Conflict', message: 'An account with this e-mail address already exists', errors: [{ field: 'email', message: 'is already registered' }] });
      }
      let shopId: string;
      let shopOwner = false;
      let role: User['role'] = 'technician';
      if (dto.shop) {
        const shop = await em.save(em.create(Shop, { ...dto.shop, currency: dto.shop.currency.toUpperCase() }));
        shopId = shop.id;
        shopOwner = true;
      } else {
        const invite = await em.findOne(Invite, { where: { code: dto.inviteCode!.toUpperCase(), usedAt: IsNull() } });
        if (!invite || invite.expiresAt.getTime() < Date.now()) {
          throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: 'The invite code is unknown, used or expired', errors: [{ field: 'inviteCode', message: 'is unknown, already used or expired' }] });
        }
        invite.usedAt = new Date();
        await em.save(invite);
        shopId = invite.shopId;
        role = invite.role;
      }
      const user = await em.save(em.create(User, { email: dto.email, emailNormalized, passwordHash, displayName: dto.displayName, role, shopId, shopOwner }));
      return user.id;
    });
    return this.issue(await this.loadUser(userId));
  }

  /**
   * Known and unknown addresses take the same path (lockout check, a bcrypt comparison, the
   * failure recorded), so neither the answer nor its time tells whether an account exists.
   */
  async login(dto: LoginDto): Promise<AuthResponse> {
    await this.lockout.begin(dto.email);
    const user = await this.users.findOne({ where: { emailNormalized: dto.email.toLowerCase() }, select: { id: true, passwordHash: true, disabled: true } });
    const ok = await bcrypt.compare(dto.password, user?.passwordHash ?? this.dummyHash);
    if (!user || !ok) {
      await this.lockout.failed();
      throw new UnauthorizedException(SIGN_IN_FAILED);
    }
    await this.lockout.succeeded(dto.email);
    if (user.disabled) throw new ForbiddenException('This account is disabled; ask an administrator');
    return this.issue(await this.loadUser(user.id));
  }

  async changePassword(userId: string, dto: ChangePasswordDto): Promise<AuthResponse> {
    const user = await this.users.findOne({ where: { id: userId }, select: { id: true, passwordHash: true, tokenVersion: true } });
    if (!user || !(await bcrypt.compare(dto.currentPassword, user.passwordHash))) {
      throw validationFailed([{ field: 'currentPassword', message: 'is not right' }]);
    }
    await this.users.update(user.id, { passwordHash: await this.hashPassword(dto.newPassword), tokenVersion: user.tokenVersion + 1 });
    return this.issue(await this.loadUser(user.id));
  }

  async me(userId: string): Promise<UserDto> {
    return toUserDto(await this.loadUser(userId));
  }

  private async loadUser(id: string): Promise<User> {
    return this.users.findOneOrFail({ where: { id }, relations: { shop: true } });
  }

  private async issue(user: User): Promise<AuthResponse> {
    const payload: JwtPayload = { sub: user.id, tv: user.tokenVersion };
    const accessToken = await this.jwt.signAsync(payload, { expiresIn: this.config.tokenTtl });
    return { accessToken, expiresIn: this.config.tokenTtl, user: toUserDto(user) };
  }
}
