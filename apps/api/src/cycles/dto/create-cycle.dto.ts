import { type CreateCycleRequest, CYCLE_NUMBER, type WeatherCase } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min } from 'class-validator';
import { SkipIfAbsent } from '../../common/validation/skip-if-absent.decorator.js';
import { ConditionField } from './condition-fields.js';

export class CreateCycleDto implements CreateCycleRequest {
  @ApiProperty({ type: 'integer', minimum: 1 })
  @IsInt()
  @Min(1)
  @Max(2_147_483_647)
  shipId: number;

  @ApiProperty({
    minimum: CYCLE_NUMBER.min,
    maximum: CYCLE_NUMBER.max,
    description: "The cycle's number in the ship's flying day.",
  })
  @IsInt({ message: 'number must be a whole number' })
  @Min(CYCLE_NUMBER.min)
  @Max(CYCLE_NUMBER.max)
  number: number;

  @ConditionField.instant('plannedLaunchAt') plannedLaunchAt: string;
  @ConditionField.instant('windowStartAt') windowStartAt: string;
  @ConditionField.instant('windowEndAt') windowEndAt: string;
  @ConditionField.shipCourseDeg() shipCourseDeg: number;
  @ConditionField.shipSpeedKt() shipSpeedKt: number;
  @ConditionField.trueWindFromDeg() trueWindFromDeg: number;
  @ConditionField.trueWindSpeedKt() trueWindSpeedKt: number;
  @SkipIfAbsent() @ConditionField.latitudeDeg() latitudeDeg?: number;
  @SkipIfAbsent() @ConditionField.longitudeDeg() longitudeDeg?: number;
  @ConditionField.temperatureC() temperatureC: number;
  @ConditionField.pressureHpa() pressureHpa: number;
  @ConditionField.weatherCase() weatherCase: WeatherCase;
  @ConditionField.flag('night') night: boolean;
}
