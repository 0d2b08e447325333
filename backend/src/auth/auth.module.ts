import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { authConfig, type AuthConfig } from '../config/configuration';
import { User } from '../users/entities/user.entity';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { SignInFailure } from './entities/sign-in-failure.entity';
import { JwtStrategy } from './jwt.strategy';
import { SignInLockout } from './sign-in-lockout';

@Module({
  imports: [
    PassportModule,
    TypeOrmModule.forFeature([User, SignInFailure]),
    JwtModule.registerAsync({
      imports: [ConfigModule.forFeature(authConfig)],
      inject: [authConfig.KEY],
      useFactory: (config: AuthConfig) => ({ secret: config.jwtSecret, signOptions: { algorithm: 'HS256' } }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, JwtStrategy, SignInLockout],
  exports: [AuthService],
})
export class AuthModule {}
