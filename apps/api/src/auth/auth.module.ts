import { createSecretKey } from 'node:crypto';
import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import type { Environment } from '../config/environment.js';
import { ACCESS_TOKEN_ALGORITHM } from './access-token.js';
import { AttemptLimits } from './attempt-limits.service.js';
import { AuthController } from './auth.controller.js';
import { CycleScope } from './cycle-scope.service.js';
import { AuthGuard } from './auth.guard.js';
import { AuthService } from './auth.service.js';
import { PersonLookup } from './person-lookup.service.js';
import { RefreshTokens } from './refresh-tokens.service.js';
import { SessionEnds } from './session-ends.service.js';
import { TokenVerifier } from './token-verifier.service.js';

@Module({
  imports: [
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => ({
        // A key object, not the string: given a string, jsonwebtoken first tries (and fails) to parse it
        // as a public key on every verify, which a profile showed costing about a millisecond per request.
        secret: createSecretKey(config.get<string>('JWT_SECRET'), 'utf8'),
        signOptions: { algorithm: ACCESS_TOKEN_ALGORITHM },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    AttemptLimits,
    PersonLookup,
    RefreshTokens,
    SessionEnds,
    TokenVerifier,
    CycleScope,
    { provide: APP_GUARD, useClass: AuthGuard },
  ],
  exports: [AttemptLimits, TokenVerifier, CycleScope, RefreshTokens, SessionEnds],
})
export class AuthModule {}
