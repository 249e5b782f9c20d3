import { type ApiError, REFUSAL_CODE_FAMILIES } from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional, ApiSchema } from '@nestjs/swagger';

const REFUSAL_CODES = [...new Set(Object.values(REFUSAL_CODE_FAMILIES).flat())].sort();

/** The one body of every 4xx and 5xx answer (the error filter writes it). */
@ApiSchema({ name: 'ApiError', description: 'The body of every refusal and error.' })
export class ApiErrorDto implements ApiError {
  @ApiProperty({ type: 'integer', minimum: 400, maximum: 599, example: 404 })
  statusCode: number;

  @ApiProperty({
    enum: REFUSAL_CODES,
    description: 'A stable machine code from the shared refusal codes; the operation lists the ones it answers.',
  })
  code: string;

  @ApiProperty({ description: 'A sentence a person understands.' })
  message: string;

  @ApiPropertyOptional({ type: [String], description: 'Field-level problems of a validation failure.' })
  details?: string[];
}
