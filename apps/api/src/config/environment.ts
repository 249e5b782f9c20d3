import { plainToInstance } from 'class-transformer';
import { IsIn, IsInt, IsNotEmpty, IsOptional, IsString, Max, Min, MinLength, validateSync } from 'class-validator';

/** Every setting the API reads, validated at boot: a bad value stops the start with a clear message. */
export class Environment {
  @IsOptional() @IsIn(['development', 'production', 'test'])
  NODE_ENV: 'development' | 'production' | 'test' = 'development';

  @IsInt() @Min(1) @Max(65535)
  PORT: number = 3000;

  @IsString() @IsNotEmpty()
  HOST: string = '127.0.0.1';

  @IsString() @IsNotEmpty()
  DB_HOST: string = '127.0.0.1';

  @IsInt() @Min(1) @Max(65535)
  DB_PORT: number = 3307;

  @IsString() @IsNotEmpty()
  DB_NAME: string = 'catline';

  @IsString() @IsNotEmpty()
  DB_USER: string = 'catline';

  @IsString()
  DB_PASSWORD: string = '';

  @IsString() @MinLength(16, { message: 'JWT_SECRET must be at least 16 characters' })
  JWT_SECRET: string;

  /** Comma-separated origins allowed for CORS and socket.io connections. */
  @IsString() @IsNotEmpty()
  WEB_ORIGINS: string = 'http://127.0.0.1:3000,http://localhost:3000';

  /** Sign-in attempts allowed per minute for one address and e-mail, against password guessing. */
  @IsInt() @Min(1)
  LOGIN_RATE_LIMIT: number = 5;

  @IsIn(['on', 'off'])
  DEMO_SEED: 'on' | 'off' = 'on';
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

export function webOrigins(environment: Pick<Environment, 'WEB_ORIGINS'>): string[] {
  return environment.WEB_ORIGINS.split(',').map((origin) => origin.trim()).filter(Boolean);
}
