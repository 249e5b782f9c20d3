import { type CreateAircraftRequest, SIDE_NUMBER_MAX_LENGTH, SIDE_NUMBER_PATTERN } from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsInt, IsNotEmpty, IsOptional, IsString, Matches, MaxLength, Min } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';

export class CreateAircraftDto implements CreateAircraftRequest {
  @ApiProperty({ example: 'C21' })
  @Trim()
  @IsString()
  @Matches(SIDE_NUMBER_PATTERN, {
    message: `sideNumber must be 1 to ${SIDE_NUMBER_MAX_LENGTH} letters, digits or dashes`,
  })
  sideNumber: string;

  @ApiProperty({ type: 'integer' })
  @IsInt()
  @Min(1)
  typeId: number;

  @ApiProperty({ type: 'integer' })
  @IsInt()
  @Min(1)
  squadronId: number;

  @ApiProperty({ example: 'bow-1', description: "One of the ship's deck spot names." })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'parkedSpot is required' })
  @MaxLength(20)
  parkedSpot: string;

  @ApiPropertyOptional({ default: true })
  @IsOptional()
  @IsBoolean()
  serviceable?: boolean;
}
