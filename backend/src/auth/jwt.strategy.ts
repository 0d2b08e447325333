import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { InjectRepository } from '@nestjs/typeorm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Repository } from 'typeorm';
import { authConfig, type AuthConfig } from '../config/configuration';
import { User } from '../users/entities/user.entity';
import type { AuthUser, JwtPayload } from './auth-user';

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(authConfig.KEY) config: AuthConfig,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {
    super({ jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(), ignoreExpiration: false, secretOrKey: config.jwtSecret, algorithms: ['HS256'] });
  }

  /** A token is good only while its user exists, is enabled and has not changed password since. */
  async validate(payload: JwtPayload): Promise<AuthUser> {
    const user = await this.users.findOne({ where: { id: payload.sub } });
    if (!user || user.disabled || user.tokenVersion !== payload.tv) {
      throw new UnauthorizedException('The sign-in has expired or was revoked; please sign in again');
    }
    return { id: user.id, email: user.email, role: user.role, shopId: user.shopId, shopOwner: user.shopOwner };
  }
}
