import { createSecretKey } from 'node:crypto';
import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import type { AppConfig } from '../config/app-config';
import { APP_CONFIG } from '../config/config.module';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JwtAuthGuard } from './jwt-auth.guard';
import { RefreshToken } from './refresh-token.entity';
import { RefreshTokensService } from './refresh-tokens.service';
import { RolesGuard } from './roles.guard';
import { SignInAttemptStore } from './sign-in-attempt.store';
import { signInThrottlerOptions } from './sign-in-throttle';
import { TokenService } from './token.service';

/** Authentication: tokens, sign-in throttling, and the global guards (JWT first, then roles). */
@Module({
  imports: [
    UsersModule,
    TypeOrmModule.forFeature([RefreshToken]),
    JwtModule.registerAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        // A key object made once: given the text, the token library would build one for every request it checks.
        secret: createSecretKey(Buffer.from(config.jwt.secret, 'utf8')),
        signOptions: { algorithm: 'HS256', issuer: config.jwt.issuer, expiresIn: config.jwt.accessTtlSeconds },
        verifyOptions: { algorithms: ['HS256'], issuer: config.jwt.issuer },
      }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => signInThrottlerOptions(config, new SignInAttemptStore()),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    TokenService,
    RefreshTokensService,
    // Order matters: the JWT guard sets request.user, which the roles guard reads.
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AuthModule {}
