import { ApiProperty, ApiSchema } from '@nestjs/swagger';

export type Health = { status: 'ok'; database: 'up' } | { status: 'error'; database: 'down' };

/** What a monitor reads, with 200 when everything answers and 503 when MariaDB does not. */
@ApiSchema({ name: 'Health' })
export class HealthDto {
  @ApiProperty({ enum: ['ok', 'error'] })
  status: Health['status'];

  @ApiProperty({ enum: ['up', 'down'] })
  database: Health['database'];
}
