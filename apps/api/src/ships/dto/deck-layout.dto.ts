import type { ElevatorLayout, HangarBayLayout, ReplaceDeckLayoutRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { PlainText } from '../../common/validation/plain-text.decorator.js';
import { Trim } from '../../common/validation/trim.decorator.js';
import { DeckSpotDto, IsTaxiTimes } from './deck-spot.dto.js';

const NAME_MAX = 20;

export class ElevatorDto implements ElevatorLayout {
  @ApiProperty({ example: 'lift-fwd' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'an elevator needs a name' })
  @PlainText()
  @MaxLength(NAME_MAX)
  name: string;

  @ApiProperty({ example: 50, description: 'One trip between the hangar deck and the flight deck, seconds.' })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  cycleS: number;

  @ApiProperty({ example: { 1: 90, 2: 80, 3: 140, 4: 150 }, description: 'Seconds, by catapult number.' })
  @IsTaxiTimes()
  taxiS: Record<number, number>;
}

export class HangarBayDto implements HangarBayLayout {
  @ApiProperty({ example: 'bay-A' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'a hangar bay needs a name' })
  @PlainText()
  @MaxLength(NAME_MAX)
  name: string;

  @ApiProperty({ example: ['lift-fwd'], description: 'Names of the elevators that serve the bay.' })
  @IsArray()
  @ArrayMaxSize(10)
  @IsString({ each: true })
  @MaxLength(NAME_MAX, { each: true })
  elevators: string[];
}

export class ReplaceDeckLayoutDto implements ReplaceDeckLayoutRequest {
  @ApiProperty({ type: [DeckSpotDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'deckSpots must list at least one spot' })
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => DeckSpotDto)
  deckSpots: DeckSpotDto[];

  @ApiProperty({ type: [ElevatorDto] })
  @IsArray()
  @ArrayMaxSize(10)
  @ValidateNested({ each: true })
  @Type(() => ElevatorDto)
  elevators: ElevatorDto[];

  @ApiProperty({ type: [HangarBayDto] })
  @IsArray()
  @ArrayMaxSize(10)
  @ValidateNested({ each: true })
  @Type(() => HangarBayDto)
  hangarBays: HangarBayDto[];

  @ApiProperty({ type: [Number], example: [3, 4], description: 'Numbers of the catapults inside the landing area.' })
  @IsArray()
  @ArrayMaxSize(9)
  @IsInt({ each: true })
  @Min(1, { each: true })
  @Max(9, { each: true })
  landingAreaCatapults: number[];
}
