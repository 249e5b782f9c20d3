import { plainToInstance, Transform } from 'class-transformer';
import {
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  Matches,
  Max,
  Min,
  MinLength,
  validateSync,
} from 'class-validator';

/** Every setting the API reads, validated at boot: a bad value stops the start with a clear message. */
export class Environment {
  @IsOptional()
  @IsIn(['development', 'production', 'test'])
  NODE_ENV: 'development' | 'production' | 'test' = 'development';

  @IsInt()
  @Min(1)
  @Max(65535)
  PORT: number = 3000;

  @IsString()
  @IsNotEmpty()
  HOST: string = '127.0.0.1';

  @IsString()
  @IsNotEmpty()
  DB_HOST: string = '127.0.0.1';

  @IsInt()
  @Min(1)
  @Max(65535)
  DB_PORT: number = 3307;

  @IsString()
  @IsNotEmpty()
  DB_NAME: string = 'catline';

  @IsString()
  @IsNotEmpty()
  DB_USER: string = 'catline';

  @IsString()
  DB_PASSWORD: string = '';

  /**
   * An asynchronous replica of DB_HOST (same database, user and password) that reports and exports
   * read from; unset, they read from DB_HOST like everything else.
   */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === '' ? undefined : value))
  @IsString()
  DB_REPLICA_HOST?: string;

  /** The replica's port; DB_PORT when unset. */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === '' ? undefined : value))
  @IsInt()
  @Min(1)
  @Max(65535)
  DB_REPLICA_PORT?: number;

  @IsString()
  @MinLength(16, { message: 'JWT_SECRET must be at least 16 characters' })
  JWT_SECRET: string;

  /** Comma-separated origins allowed for CORS and socket.io connections. */
  @IsString()
  @IsNotEmpty()
  WEB_ORIGINS: string = 'http://127.0.0.1:3000,http://localhost:3000';

  /** Sign-in attempts allowed per minute for one person (or unknown e-mail); ten times that from one client address. */
  @IsInt()
  @Min(1)
  LOGIN_RATE_LIMIT: number = 5;

  /** Password-reset requests allowed per 15 minutes for one e-mail (ten times that from one client address). */
  @IsInt()
  @Min(1)
  PASSWORD_RESET_RATE_LIMIT: number = 3;

  @IsIn(['on', 'off'])
  DEMO_SEED: 'on' | 'off' = 'on';

  /** The SMTP server mail goes to; by default the local mail catcher `npm start` runs. */
  @IsString()
  @IsNotEmpty()
  SMTP_HOST: string = '127.0.0.1';

  @IsInt()
  @Min(1)
  @Max(65535)
  SMTP_PORT: number = 1025;

  @IsString()
  @IsNotEmpty()
  MAIL_FROM: string = 'Catline <catline@catline.example>';

  /** Where people open the app; the links in mails start with it. */
  @IsUrl(
    { require_tld: false, protocols: ['http', 'https'], require_protocol: true },
    { message: 'APP_URL must be an http(s) address' },
  )
  APP_URL: string = 'http://127.0.0.1:3000';

  /** `off` keeps mail in the outbox unsent (the integration tests, except the spec that reads mail). */
  /**
   * Express's `trust proxy` when a TLS-terminating proxy stands in front: `loopback`, a hop count, or
   * comma-separated addresses/subnets. The client address and the refresh cookie's `Secure` flag then
   * come from the proxy's X-Forwarded-* headers. Unset, nothing in front is trusted.
   */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === '' ? undefined : value))
  @Matches(/^(loopback|linklocal|uniquelocal|\d{1,2}|[0-9a-fA-F.:/]+(\s*,\s*[0-9a-fA-F.:/]+)*)$/, {
    message: 'TRUST_PROXY must be loopback, linklocal, uniquelocal, a hop count, or comma-separated addresses',
  })
  TRUST_PROXY?: string;

  @IsIn(['on', 'off'])
  MAIL_SENDER: 'on' | 'off' = 'on';

  /**
   * Set when several API processes serve one board (redis://host:port): socket.io rooms then span
   * every process through this Redis. Unset, one process keeps its rooms in memory.
   */
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === '' ? undefined : value))
  @IsUrl(
    { require_tld: false, protocols: ['redis', 'rediss'], require_protocol: true },
    { message: 'REDIS_URL must be a redis:// address' },
  )
  REDIS_URL?: string;
}

export function validateEnvironment(raw: Record<string, unknown>): Environment {
  const environment = plainToInstance(Environment, raw, { enableImplicitConversion: true });
  const errors = validateSync(environment, { skipMissingProperties: false });
  if (errors.length > 0) {
    const problems = errors.flatMap((error) => Object.values(error.constraints ?? {}));
    throw new Error(`Invalid configuration: ${problems.join('; ')}`);
  }
  return environment;
}

/** The .env of the workspace root, whether the API runs from the root or from apps/api. */
export const ENV_FILE_PATHS = ['.env', '../../.env'];

/**
 * True when several API processes share one deck through Redis (REDIS_URL): what a process keeps in
 * memory about rows others may write must then be read again instead.
 */
export function runsClustered(environment: Pick<Environment, 'REDIS_URL'>): boolean {
  return Boolean(environment.REDIS_URL);
}

export function webOrigins(environment: Pick<Environment, 'WEB_ORIGINS'>): string[] {
  return environment.WEB_ORIGINS.split(',')
    .map((origin) => origin.trim())
    .filter(Boolean);
}

/** True when people open the app over HTTPS (APP_URL); ship networks often serve plain HTTP inside. */
export function servedOverHttps(environment: Pick<Environment, 'APP_URL'>): boolean {
  return new URL(environment.APP_URL).protocol === 'https:';
}

/** Express's `trust proxy` value for TRUST_PROXY: a hop count as a number, anything else as written. */
export function trustedProxies(environment: Pick<Environment, 'TRUST_PROXY'>): string | number | false {
  const value = environment.TRUST_PROXY?.trim();
  if (!value) return false;
  return /^\d+$/.test(value) ? Number(value) : value;
}
