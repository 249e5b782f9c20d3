import {
  type ReplaceStoresCatalogueRequest,
  STORES_CATALOGUE_MAX_ITEMS,
  STORES_ITEM_WEIGHT_LB,
  type StoresItem,
} from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsInt, Max, Min, ValidateNested } from 'class-validator';
import { StoresItemNameField } from '../../common/validation/stores-item-name.field.js';

export class StoresItemBodyDto implements StoresItem {
  @StoresItemNameField('each stores item needs a name', { example: 'Practice bomb' })
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
