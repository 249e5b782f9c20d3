import type { DeckSpot } from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsNotEmpty, IsOptional, IsString, MaxLength, ValidateBy } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';
import { PlainText } from '../../common/validation/plain-text.decorator.js';

const MAX_TAXI_S = 3600;

function isTaxiTimes(value: unknown): boolean {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const entries = Object.entries(value);
  return (
    entries.length > 0 &&
    entries.every(
      ([key, seconds]) => /^[1-9]$/.test(key) && Number.isFinite(seconds) && (seconds as number) <= MAX_TAXI_S,
    )
  );
}

/**
 * Catapult numbers to seconds, at most MAX_TAXI_S; whether every catapult has one and none is below 0 is
 * the deck's rule (deckLayoutProblems), answered with a sentence naming the spot or elevator.
 */
export const IsTaxiTimes = () =>
  ValidateBy({
    name: 'isTaxiTimes',
    validator: {
      validate: isTaxiTimes,
      defaultMessage: () => `$property must map catapult numbers to taxi times in seconds (at most ${MAX_TAXI_S})`,
    },
  });

export class DeckSpotDto implements DeckSpot {
  @ApiProperty({ example: 'bow-1' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'a deck spot needs a name' })
  @PlainText()
  @MaxLength(20)
  name: string;

  @ApiPropertyOptional({ example: 'Bow', description: 'The named deck area the spot belongs to.' })
  @IsOptional()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'a deck area needs a name' })
  @PlainText()
  @MaxLength(40)
  area?: string;

  @ApiPropertyOptional({
    example: ['bow-1'],
    description: 'Spots in front of this one in its row, which must be clear before an aircraft here can taxi out.',
  })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @MaxLength(20, { each: true })
  clearBefore?: string[];

  @ApiProperty({ example: { 1: 70, 2: 60, 3: 150, 4: 170 }, description: 'Seconds, by catapult number.' })
  @IsTaxiTimes()
  taxiS: Record<number, number>;
}
