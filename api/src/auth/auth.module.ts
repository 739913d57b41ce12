import { Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { UsersModule } from '../users/users.module.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtStrategy } from './jwt.strategy.js';
import { RefreshTokensRepository } from './refresh-tokens.repository.js';
import { PostgresThrottlerStorage, SignInThrottleGuard, ThrottleStorageModule } from './sign-in-throttle.js';

@Module({
  imports: [
    UsersModule,
    PassportModule,
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({ secret: config.jwtSecret, signOptions: { algorithm: 'HS256' } }),
    }),
    ThrottlerModule.forRootAsync({
      imports: [ThrottleStorageModule],
      inject: [APP_CONFIG, PostgresThrottlerStorage],
      useFactory: (config: AppConfig, storage: PostgresThrottlerStorage) => ({
        throttlers: [{ name: 'sign-in', ttl: config.signInWindowSeconds * 1000, limit: config.signInLimit }],
        storage,
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [AuthService, JwtStrategy, RefreshTokensRepository, SignInThrottleGuard],
})
export class AuthModule {}
