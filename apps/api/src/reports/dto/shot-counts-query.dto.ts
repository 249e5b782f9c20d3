import type { ShotCountsQuery } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Matches } from 'class-validator';

const DAY = /^\d{4}-\d{2}-\d{2}$/;

export class ShotCountsQueryDto implements ShotCountsQuery {
  @ApiProperty({ example: '2027-01-01', description: 'First UTC day counted, YYYY-MM-DD.' })
  @Matches(DAY, { message: 'from must be a day written YYYY-MM-DD, e.g. 2027-01-01' })
  from: string;

  @ApiProperty({ example: '2027-01-31', description: 'Last UTC day counted (included), YYYY-MM-DD.' })
  @Matches(DAY, { message: 'to must be a day written YYYY-MM-DD, e.g. 2027-01-31' })
  to: string;
}
