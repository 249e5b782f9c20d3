import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import type { Environment } from '../config/environment.js';

export const LOGIN_WINDOW_S = 60;

export type AttemptVerdict = { allowed: true } | { allowed: false; retryAfterS: number };

/**
 * Sign-in attempts per key (client address and e-mail) in one-minute windows, counted by
 * rate-limiter-flexible in memory: one API process guards its own login route. (@nestjs/throttler
 * is CommonJS requiring the ESM-only @nestjs/common 12, which Jest on Node 20 cannot load.)
 */
@Injectable()
export class LoginAttempts {
  private readonly limiter: RateLimiterMemory;

  constructor(config: ConfigService<Environment, true>) {
    this.limiter = new RateLimiterMemory({ points: config.get('LOGIN_RATE_LIMIT'), duration: LOGIN_WINDOW_S });
  }

  /** Counts one attempt for the key and says whether it may go ahead. */
  async record(key: string): Promise<AttemptVerdict> {
    try {
      await this.limiter.consume(key);
      return { allowed: true };
    } catch (refusal) {
      if (!(refusal instanceof RateLimiterRes)) throw refusal;
      return { allowed: false, retryAfterS: Math.max(1, Math.ceil(refusal.msBeforeNext / 1000)) };
    }
  }
}
