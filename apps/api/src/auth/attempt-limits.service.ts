import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { type RateLimiterAbstract, RateLimiterMemory, RateLimiterRedis, RateLimiterRes } from 'rate-limiter-flexible';
import { createClient } from 'redis';
import { TooManyAttemptsException } from '../common/errors/too-many-attempts.exception.js';
import type { Environment } from '../config/environment.js';

/** What is counted: sign-ins per person and per client address, reset requests per e-mail and per client address. */
export type AttemptKind = 'sign_in' | 'sign_in_from' | 'reset' | 'reset_from';

interface Limit {
  points: number;
  durationS: number;
  /** The refusal, given the seconds to wait. */
  message: (waitS: number) => string;
}

/** A client address may try ten times what one person may: several people sign in from one console. */
const PER_ADDRESS = 10;
const RESET_WINDOW_S = 15 * 60;

function limits(
  environment: Pick<Environment, 'LOGIN_RATE_LIMIT' | 'PASSWORD_RESET_RATE_LIMIT'>,
): Record<AttemptKind, Limit> {
  const wait = (waitS: number) => `Wait ${waitS} seconds, then try again.`;
  return {
    sign_in: {
      points: environment.LOGIN_RATE_LIMIT,
      durationS: 60,
      message: (s) => `Too many sign-in attempts for this e-mail. ${wait(s)}`,
    },
    sign_in_from: {
      points: environment.LOGIN_RATE_LIMIT * PER_ADDRESS,
      durationS: 60,
      message: (s) => `Too many sign-in attempts from this computer. ${wait(s)}`,
    },
    reset: {
      points: environment.PASSWORD_RESET_RATE_LIMIT,
      durationS: RESET_WINDOW_S,
      message: (s) => `Too many password requests for this e-mail. ${wait(s)}`,
    },
    reset_from: {
      points: environment.PASSWORD_RESET_RATE_LIMIT * PER_ADDRESS,
      durationS: RESET_WINDOW_S,
      message: (s) => `Too many password requests from this computer. ${wait(s)}`,
    },
  };
}

/**
 * Attempt counters of rate-limiter-flexible: in memory for one API process, in Redis with REDIS_URL so
 * that every process counts the same attempts (else each would grant the whole allowance again).
 */
@Injectable()
export class AttemptLimits implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger(AttemptLimits.name);
  private readonly limits: Record<AttemptKind, Limit>;
  private readonly limiters: Record<AttemptKind, RateLimiterAbstract>;
  private readonly redis?: ReturnType<typeof createClient>;

  constructor(config: ConfigService<Environment, true>) {
    this.limits = limits({
      LOGIN_RATE_LIMIT: config.get('LOGIN_RATE_LIMIT'),
      PASSWORD_RESET_RATE_LIMIT: config.get('PASSWORD_RESET_RATE_LIMIT'),
    });
    const url = config.get('REDIS_URL', { infer: true });
    if (url) {
      this.redis = createClient({ url });
      this.redis.on('error', (error: Error) => this.logger.error(`Redis at ${url}: ${error.message}`));
    }
    const entries = Object.entries(this.limits).map(([kind, { points, durationS }]) => {
      const options = { points, duration: durationS, keyPrefix: `catline:attempts:${kind}` };
      return [
        kind,
        this.redis
          ? new RateLimiterRedis({ ...options, storeClient: this.redis, useRedisPackage: true })
          : new RateLimiterMemory(options),
      ];
    });
    this.limiters = Object.fromEntries(entries) as Record<AttemptKind, RateLimiterAbstract>;
  }

  async onModuleInit(): Promise<void> {
    await this.redis?.connect();
  }

  async onModuleDestroy(): Promise<void> {
    if (this.redis?.isOpen) await this.redis.close();
  }

  /** Counts one attempt under the key; throws TooManyAttemptsException (429, with the wait) past the limit. */
  async count(kind: AttemptKind, key: string): Promise<void> {
    try {
      await this.limiters[kind].consume(key);
    } catch (refusal) {
      if (!(refusal instanceof RateLimiterRes)) throw refusal;
      const waitS = Math.max(1, Math.ceil(refusal.msBeforeNext / 1000));
      throw new TooManyAttemptsException(this.limits[kind].message(waitS), waitS);
    }
  }
}
