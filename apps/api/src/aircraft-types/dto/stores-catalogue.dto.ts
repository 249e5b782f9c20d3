import {
  type ReplaceStoresCatalogueRequest,
  STORES_CATALOGUE_MAX_ITEMS,
  STORES_ITEM_NAME_MAX_LENGTH,
  STORES_ITEM_WEIGHT_LB,
  type StoresItem,
} from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsInt,
  IsNotEmpty,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { PlainText } from '../../common/validation/plain-text.decorator.js';
import { Trim } from '../../common/validation/trim.decorator.js';

export class StoresItemBodyDto implements StoresItem {
  @ApiProperty({ example: 'Practice bomb' })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'each stores item needs a name' })
  @PlainText()
  @MaxLength(STORES_ITEM_NAME_MAX_LENGTH)
  name: string;

  @ApiProperty({ description: 'Weight of one item, whole pounds.' })
  @IsInt({ message: 'the weight of a stores item is whole pounds' })
  @Min(STORES_ITEM_WEIGHT_LB.min)
  @Max(STORES_ITEM_WEIGHT_LB.max)
  weightEachLb: number;
}

export class StoresCatalogueDto implements ReplaceStoresCatalogueRequest {
  @ApiProperty({ type: [StoresItemBodyDto], description: 'The whole catalogue; names unique regardless of case.' })
  @IsArray()
  @ArrayMaxSize(STORES_CATALOGUE_MAX_ITEMS)
  @ValidateNested({ each: true })
  @Type(() => StoresItemBodyDto)
  items: StoresItemBodyDto[];
}
