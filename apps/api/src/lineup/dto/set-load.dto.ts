import { FUEL_LB, type SetLoadRequest, STORES_COUNT, STORES_LINES_MAX } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsInt, Max, Min, ValidateNested } from 'class-validator';
import { StoresItemNameField } from '../../common/validation/stores-item-name.field.js';
import { VersionField } from './fields.js';

export class StoresLineDto {
  @StoresItemNameField('each stores line needs the name of a catalogue item', {
    description: "An item of the aircraft type's stores catalogue, by name.",
  })
  name: string;

  @ApiProperty({ type: 'integer', minimum: STORES_COUNT.min, maximum: STORES_COUNT.max })
  @IsInt({ message: 'the count of a stores line is a whole number' })
  @Min(STORES_COUNT.min, { message: 'the count of a stores line is at least 1; leave the item out to load none' })
  @Max(STORES_COUNT.max)
  count: number;
}

export class SetLoadDto implements SetLoadRequest {
  @VersionField('The slot version the load is based on.')
  slotVersion: number;

  @ApiProperty({ type: 'integer', minimum: FUEL_LB.min, maximum: FUEL_LB.max, description: 'Fuel on board, pounds.' })
  @IsInt({ message: 'fuel on board is whole pounds' })
  @Min(FUEL_LB.min, { message: 'fuel on board cannot be negative' })
  @Max(FUEL_LB.max)
  fuelLb: number;

  @ApiProperty({ type: [StoresLineDto], description: 'The whole stores list; empty for a clean aircraft.' })
  @IsArray()
  @ArrayMaxSize(STORES_LINES_MAX)
  @ValidateNested({ each: true })
  @Type(() => StoresLineDto)
  stores: StoresLineDto[];
}
