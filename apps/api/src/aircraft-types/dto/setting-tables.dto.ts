import {
  AIRCRAFT_TYPE_RANGES,
  CATAPULT_SETTING,
  GROSS_WEIGHT_LB,
  LAUNCH_CONFIGURATIONS,
  type LaunchConfiguration,
  type ReplaceSettingTablesRequest,
  SETTING_TABLE_ROWS_MAX,
  SETTING_TABLES_MAX,
  type SettingTable,
  type SettingTableRow,
} from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, IsInt, IsNumber, Max, Min, ValidateNested } from 'class-validator';

export class SettingTableRowBodyDto implements SettingTableRow {
  @ApiProperty({ description: 'Upper gross-weight bound of the row, whole pounds (inclusive).' })
  @IsInt({ message: 'the weight of a setting row is whole pounds' })
  @Min(GROSS_WEIGHT_LB.min)
  @Max(GROSS_WEIGHT_LB.max)
  upToLb: number;

  @ApiProperty({ description: "Whole-number catapult setting, from 0 to the catapult's highest." })
  @IsInt({ message: 'a catapult setting is a whole number' })
  @Min(CATAPULT_SETTING.min)
  @Max(CATAPULT_SETTING.max)
  setting: number;
}

export class SettingTableBodyDto implements SettingTable {
  @ApiProperty({ description: "The number of one of the type's ship's catapults." })
  @IsInt({ message: 'the catapult number is a whole number' })
  @Min(1)
  @Max(99)
  catapultNumber: number;

  @ApiProperty({ enum: LAUNCH_CONFIGURATIONS })
  @IsIn(LAUNCH_CONFIGURATIONS, { message: `the configuration is one of ${LAUNCH_CONFIGURATIONS.join(', ')}` })
  configuration: LaunchConfiguration;

  @ApiProperty({ description: 'The excess wind over deck the launch data recommends, knots.' })
  @IsNumber()
  @Min(AIRCRAFT_TYPE_RANGES.requiredExcessKt.min)
  @Max(AIRCRAFT_TYPE_RANGES.requiredExcessKt.max)
  recommendedExcessKt: number;

  @ApiProperty({ type: [SettingTableRowBodyDto], description: 'By strictly rising weight.' })
  @IsArray()
  @ArrayMinSize(1, { message: 'a setting table needs at least one row' })
  @ArrayMaxSize(SETTING_TABLE_ROWS_MAX)
  @ValidateNested({ each: true })
  @Type(() => SettingTableRowBodyDto)
  rows: SettingTableRowBodyDto[];
}

export class SettingTablesDto implements ReplaceSettingTablesRequest {
  @ApiProperty({
    type: [SettingTableBodyDto],
    description: 'Every table of the type; one per catapult and configuration.',
  })
  @IsArray()
  @ArrayMaxSize(SETTING_TABLES_MAX)
  @ValidateNested({ each: true })
  @Type(() => SettingTableBodyDto)
  tables: SettingTableBodyDto[];
}
