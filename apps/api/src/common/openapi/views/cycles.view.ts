import {
  CYCLE_STATES,
  type CycleLanding,
  type CycleState,
  type CycleView,
  LANDING_AREA_STATES,
  type LandingAreaState,
  type LaunchPrerequisiteView,
  type RespotView,
  WEATHER_CASES,
  type WeatherCase,
} from '@catline/contracts';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { RespotViewDto } from './deck.view.js';
import { EnumProperty, IdProperty, InstantProperty, IntProperty } from './fields.js';
import { PageDto } from './paging.view.js';

@ApiSchema({ name: 'LaunchPrerequisiteView' })
export class LaunchPrerequisiteViewDto implements LaunchPrerequisiteView {
  @ApiProperty({ description: 'The prerequisite in the ship profile’s words.' })
  name: string;

  @ApiProperty({ description: 'True once the air boss has ticked it for this cycle.' })
  ticked: boolean;

  @ApiProperty({ type: 'string', nullable: true, description: 'Who ticked it; null while not ticked.' })
  tickedBy: string | null;

  @InstantProperty({ nullable: true, description: 'When it was ticked; null while not ticked.' })
  tickedAt: string | null;
}

@ApiSchema({ name: 'CycleView' })
export class CycleViewDto implements CycleView {
  @IdProperty()
  id: number;

  @IdProperty()
  shipId: number;

  @IntProperty({ minimum: 1 })
  number: number;

  @InstantProperty()
  plannedLaunchAt: string;

  @InstantProperty()
  windowStartAt: string;

  @InstantProperty()
  windowEndAt: string;

  @EnumProperty(CYCLE_STATES, 'CycleState')
  state: CycleState;

  @EnumProperty(LANDING_AREA_STATES, 'LandingAreaState', {
    description: 'Set by the air boss or the handler; the catapults inside it pause unless clear.',
  })
  landingArea: LandingAreaState;

  @ApiProperty({ type: 'string', nullable: true, description: 'Why the landing area is fouled; null when none.' })
  landingAreaReason: string | null;

  @ApiProperty({ type: () => RespotViewDto, nullable: true, description: 'Null until the handler builds one.' })
  respot: RespotView | null;

  @IntProperty({ minimum: 0, description: 'Bumped by one with every accepted change; orders the change log.' })
  version: number;

  @IntProperty({ minimum: 0 })
  slotCount: number;

  @IntProperty({ minimum: 0 })
  launchedCount: number;

  @ApiProperty({ description: 'Degrees true.' })
  shipCourseDeg: number;

  @ApiProperty({ description: 'Knots.' })
  shipSpeedKt: number;

  @ApiProperty({ description: 'Direction the true wind blows from, degrees true.' })
  trueWindFromDeg: number;

  @ApiProperty({ description: 'Knots.' })
  trueWindSpeedKt: number;

  @ApiProperty({ description: 'Degrees Celsius.' })
  temperatureC: number;

  @ApiProperty({ description: 'Hectopascals.' })
  pressureHpa: number;

  @EnumProperty(WEATHER_CASES, 'WeatherCase')
  weatherCase: WeatherCase;

  @ApiProperty()
  night: boolean;

  @ApiProperty({ description: 'Direction the gust blows from, degrees true.' })
  windGustFromDeg: number;

  @ApiProperty({ description: 'Gust, knots over the ground.' })
  windGustKt: number;

  @ApiProperty({ description: 'Direction the lull blows from, degrees true.' })
  windLullFromDeg: number;

  @ApiProperty({ description: 'Lull, knots over the ground; the minimum headwind is checked against it.' })
  windLullKt: number;

  @InstantProperty({ description: 'When the wind reading in force was taken.' })
  windReadAt: string;

  @InstantProperty({ description: 'When that reading turns stale by the ship profile; stations flag it from then.' })
  windStaleAt: string;

  @ApiProperty({ type: 'number', nullable: true, description: 'Degrees north; null when not given.' })
  latitudeDeg: number | null;

  @ApiProperty({ type: 'number', nullable: true, description: 'Degrees east; null when not given.' })
  longitudeDeg: number | null;

  @ApiProperty({ description: 'The ship’s time zone (IANA name) the cycle’s times are shown in.' })
  timeZone: string;

  @ApiProperty({
    type: () => LaunchPrerequisiteViewDto,
    isArray: true,
    description:
      'The ship profile’s launch prerequisites with the air boss’s ticks; launching starts once all are ticked.',
  })
  launchPrerequisites: LaunchPrerequisiteView[];
}

export const CyclePageDto = PageDto(CycleViewDto, 'Cycle', 'One page of the cycles, newest planned launch first.');

@ApiSchema({ name: 'CycleLanding' })
export class CycleLandingDto implements CycleLanding {
  @IdProperty({ nullable: true, description: 'The cycle to open; null when the ship has no cycle.' })
  cycleId: number | null;
}
