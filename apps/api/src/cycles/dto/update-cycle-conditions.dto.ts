import type { UpdateCycleConditionsRequest, WeatherCase } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min } from 'class-validator';
import { SkipIfAbsent } from '../../common/validation/skip-if-absent.decorator.js';
import { ConditionField } from './condition-fields.js';

// Fields left out keep their value; an explicit null is refused like any other bad value.
export class UpdateCycleConditionsDto implements UpdateCycleConditionsRequest {
  @ApiProperty({ minimum: 0, description: 'The cycle version the change was based on.' })
  @IsInt()
  @Min(0)
  @Max(2_147_483_647)
  basisVersion: number;

  @SkipIfAbsent() @ConditionField.instant('plannedLaunchAt') plannedLaunchAt?: string;
  @SkipIfAbsent() @ConditionField.instant('windowStartAt') windowStartAt?: string;
  @SkipIfAbsent() @ConditionField.instant('windowEndAt') windowEndAt?: string;
  @SkipIfAbsent() @ConditionField.shipCourseDeg() shipCourseDeg?: number;
  @SkipIfAbsent() @ConditionField.shipSpeedKt() shipSpeedKt?: number;
  @SkipIfAbsent() @ConditionField.trueWindFromDeg() trueWindFromDeg?: number;
  @SkipIfAbsent() @ConditionField.trueWindSpeedKt() trueWindSpeedKt?: number;
  @SkipIfAbsent() @ConditionField.relativeWindBearingDeg() relativeWindBearingDeg?: number;
  @SkipIfAbsent() @ConditionField.relativeWindSpeedKt() relativeWindSpeedKt?: number;
  @SkipIfAbsent() @ConditionField.windGustKt() windGustKt?: number;
  @SkipIfAbsent() @ConditionField.windLullKt() windLullKt?: number;
  @SkipIfAbsent() @ConditionField.instant('windReadAt') windReadAt?: string;
  @SkipIfAbsent() @ConditionField.latitudeDeg() latitudeDeg?: number;
  @SkipIfAbsent() @ConditionField.longitudeDeg() longitudeDeg?: number;
  @SkipIfAbsent() @ConditionField.temperatureC() temperatureC?: number;
  @SkipIfAbsent() @ConditionField.pressureHpa() pressureHpa?: number;
  @SkipIfAbsent() @ConditionField.weatherCase() weatherCase?: WeatherCase;
  @SkipIfAbsent() @ConditionField.flag('night') night?: boolean;
}
