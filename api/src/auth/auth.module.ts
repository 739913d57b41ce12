import { Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { UsersModule } from '../users/users.module.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtStrategy } from './jwt.strategy.js';
import { RefreshTokensRepository } from './refresh-tokens.repository.js';
import { DeviceCookies } from './device-cookie.js';
import { SignInFailuresRepository } from './sign-in-failures.repository.js';
import { SignInLimiter } from './sign-in-limiter.js';

@Module({
  imports: [
    UsersModule,
    PassportModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({ secret: config.jwtSecret, signOptions: { algorithm: 'HS256' } }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, JwtStrategy, RefreshTokensRepository, SignInFailuresRepository, SignInLimiter, DeviceCookies],
  exports: [RefreshTokensRepository],
})
export class AuthModule {}
