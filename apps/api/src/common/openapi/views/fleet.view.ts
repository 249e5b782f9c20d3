import {
  AIRCRAFT_CLASSES,
  type AircraftClass,
  type AircraftTypeView,
  type AircraftView,
  type CatapultPosition,
  type CatapultStatus,
  type CatapultView,
  type DeckLayout,
  type DeckSpot,
  type ElevatorLayout,
  type HangarBayLayout,
  type LaunchTableRow,
  READINESS_STEPS,
  type ReadinessStep,
  ROLES,
  type Role,
  type ShipProfile,
  type ShipView,
  type SquadronView,
  type StoresItem,
  LAUNCH_CONFIGURATIONS,
  type LaunchConfiguration,
  type SettingTable,
  type SettingTableRow,
  type TrimBand,
  type UserView,
  type WeatherCase,
} from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional, ApiSchema } from '@nestjs/swagger';
import { EnumProperty, IdProperty, IntProperty } from './fields.js';
import { PageDto } from './paging.view.js';

export const CATAPULT_POSITIONS: CatapultPosition[] = ['bow', 'waist'];
export const CATAPULT_STATUSES: CatapultStatus[] = ['up', 'down'];

@ApiSchema({ name: 'CatapultView' })
export class CatapultViewDto implements CatapultView {
  @IdProperty()
  id: number;

  @IdProperty()
  shipId: number;

  @IntProperty({ minimum: 1, description: '1 to 4.' })
  number: number;

  @EnumProperty(CATAPULT_POSITIONS, 'CatapultPosition')
  position: CatapultPosition;

  @ApiProperty({ description: "Axis angle relative to the ship's heading, degrees; negative to port." })
  axisAngleDeg: number;

  @ApiProperty({ description: 'Metres.' })
  strokeM: number;

  @ApiProperty({ description: 'Energy at the lowest setting, megajoules.' })
  energyMinMj: number;

  @ApiProperty({ description: 'Energy at the highest setting, megajoules.' })
  energyMaxMj: number;

  @IntProperty({ minimum: 1 })
  settingCount: number;

  @ApiProperty({ description: 'Launch to next launch on this catapult, seconds.' })
  resetIntervalS: number;

  @IntProperty({ description: 'Catapults with the same pair number share the minimum pair gap.' })
  pair: number;

  @EnumProperty(CATAPULT_STATUSES, 'CatapultStatus')
  status: CatapultStatus;

  @IntProperty({ minimum: 0 })
  shotCount: number;

  @ApiProperty({
    enum: READINESS_STEPS,
    isArray: true,
    nullable: true,
    description:
      "The readiness steps this catapult runs when they differ from the ship's; null when it runs the ship's.",
  })
  readinessSteps: ReadinessStep[] | null;
}

@ApiSchema({ name: 'DeckSpot' })
export class DeckSpotDto implements DeckSpot {
  @ApiProperty()
  name: string;

  @ApiProperty({
    type: 'object',
    additionalProperties: { type: 'number' },
    description: 'Taxi time from this spot to each catapult, seconds, keyed by catapult number.',
  })
  taxiS: Record<number, number>;

  @ApiProperty({ required: false, description: 'The named deck area the spot belongs to.' })
  area?: string;

  @ApiProperty({
    type: [String],
    required: false,
    description: 'Spots in front of this one in its row, which must be clear before an aircraft here can taxi out.',
  })
  clearBefore?: string[];
}

@ApiSchema({ name: 'ElevatorLayout' })
export class ElevatorLayoutDto implements ElevatorLayout {
  @ApiProperty()
  name: string;

  @ApiProperty({ description: 'One trip between the hangar deck and the flight deck, seconds.' })
  cycleS: number;

  @ApiProperty({
    type: 'object',
    additionalProperties: { type: 'number' },
    description: 'Taxi time from the elevator at flight-deck level to each catapult, seconds, by catapult number.',
  })
  taxiS: Record<number, number>;
}

@ApiSchema({ name: 'HangarBayLayout' })
export class HangarBayLayoutDto implements HangarBayLayout {
  @ApiProperty()
  name: string;

  @ApiProperty({ type: [String], description: 'Names of the elevators that serve the bay.' })
  elevators: string[];
}

@ApiSchema({ name: 'DeckLayout', description: "The ship's elevators, hangar bays and landing-area catapults." })
export class DeckLayoutDto implements DeckLayout {
  @ApiProperty({ type: [ElevatorLayoutDto] })
  elevators: ElevatorLayout[];

  @ApiProperty({ type: [HangarBayLayoutDto] })
  hangarBays: HangarBayLayout[];

  @ApiProperty({ type: [Number], description: 'Numbers of the catapults inside the landing area.' })
  landingAreaCatapults: number[];
}

@ApiSchema({ name: 'ClearingTurns' })
class ClearingTurnsDto {
  @ApiProperty({ description: 'Degrees; positive to starboard.' })
  bow: number;

  @ApiProperty({ description: 'Degrees; positive to starboard.' })
  waist: number;
}

@ApiSchema({ name: 'ClassDepartures' })
class ClassDeparturesDto implements Record<AircraftClass, string> {
  @ApiProperty()
  jet: string;

  @ApiProperty()
  turboprop: string;

  @ApiProperty()
  helicopter: string;
}

@ApiSchema({ name: 'Departures' })
class DeparturesDto implements Record<WeatherCase, ClassDeparturesDto> {
  @ApiProperty({ type: () => ClassDeparturesDto })
  I: ClassDeparturesDto;

  @ApiProperty({ type: () => ClassDeparturesDto })
  II: ClassDeparturesDto;

  @ApiProperty({ type: () => ClassDeparturesDto })
  III: ClassDeparturesDto;
}

@ApiSchema({ name: 'ShipProfile', description: "The ship's own after-the-shot profile." })
export class ShipProfileDto implements ShipProfile {
  @ApiProperty({
    type: () => ClearingTurnsDto,
    description: 'Clearing turn off a bow and a waist catapult in cases I and II; none in case III.',
  })
  clearingTurnDeg: ClearingTurnsDto;

  @ApiProperty({ type: () => DeparturesDto, description: 'Departure instruction per weather case and aircraft class.' })
  departures: DeparturesDto;

  @ApiPropertyOptional({
    enum: READINESS_STEPS,
    isArray: true,
    description: 'The readiness steps the ship runs, in the trade’s order; left out, every step.',
  })
  readinessSteps?: ReadinessStep[];

  @ApiPropertyOptional({ type: 'integer', description: 'Minutes a wind reading stays fresh; left out, 30.' })
  windReadingMaxAgeMin?: number;

  @ApiPropertyOptional({
    type: 'integer',
    description: 'Settings the energy model may differ from the approved setting before it is flagged; left out, 2.',
  })
  settingCrossCheckTolerance?: number;

  @ApiPropertyOptional({ description: 'The ship’s time zone, an IANA name; left out, UTC.' })
  timeZone?: string;

  @ApiPropertyOptional({
    type: 'string',
    isArray: true,
    description: 'What the air boss ticks for each cycle before launching starts; left out, none.',
  })
  launchPrerequisites?: string[];
}

@ApiSchema({ name: 'ShipView' })
export class ShipViewDto implements ShipView {
  @IdProperty()
  id: number;

  @ApiProperty()
  name: string;

  @ApiProperty()
  hullCode: string;

  @ApiProperty({ description: 'Minimum time between launches of the two catapults of a pair, seconds.' })
  pairGapS: number;

  @ApiProperty({ type: () => ShipProfileDto })
  profile: ShipProfile;

  @ApiProperty({ type: [DeckSpotDto] })
  deckSpots: DeckSpot[];

  @ApiProperty({ type: () => DeckLayoutDto })
  deckLayout: DeckLayout;

  @ApiProperty({ type: [CatapultViewDto] })
  catapults: CatapultView[];
}

@ApiSchema({ name: 'SquadronView' })
export class SquadronViewDto implements SquadronView {
  @IdProperty()
  id: number;

  @IdProperty({ description: 'The ship it belongs to.' })
  shipId: number;

  @ApiProperty()
  name: string;

  @ApiProperty()
  code: string;

  @ApiProperty({ format: 'email', description: 'Where the cycle summary goes.' })
  email: string;
}

@ApiSchema({ name: 'TrimBand' })
export class TrimBandDto implements TrimBand {
  @IntProperty({ nullable: true, description: 'Upper gross-weight bound of the band, lb; null for the last band.' })
  upToLb: number | null;

  @ApiProperty({ description: 'Degrees.' })
  trimDeg: number;
}

@ApiSchema({ name: 'LaunchTableRow' })
export class LaunchTableRowDto implements LaunchTableRow {
  @IntProperty({ minimum: 0, description: 'Pounds.' })
  grossWeightLb: number;

  @ApiProperty({ description: 'Knots.' })
  minLaunchAirspeedKt: number;
}

@ApiSchema({ name: 'StoresItem' })
export class StoresItemDto implements StoresItem {
  @ApiProperty()
  name: string;

  @IntProperty({ minimum: 1, description: 'Weight of one item, pounds.' })
  weightEachLb: number;
}

@ApiSchema({ name: 'SettingTableRow' })
export class SettingTableRowDto implements SettingTableRow {
  @IntProperty({ minimum: 1, description: 'Upper gross-weight bound of the row, pounds (inclusive).' })
  upToLb: number;

  @IntProperty({ minimum: 0 })
  setting: number;
}

@ApiSchema({ name: 'SettingTable' })
export class SettingTableDto implements SettingTable {
  @IntProperty({ minimum: 1 })
  catapultNumber: number;

  @EnumProperty(LAUNCH_CONFIGURATIONS, 'LaunchConfiguration')
  configuration: LaunchConfiguration;

  @ApiProperty({ description: 'Knots.' })
  recommendedExcessKt: number;

  @ApiProperty({ type: [SettingTableRowDto], description: 'By strictly rising weight.' })
  rows: SettingTableRow[];
}

@ApiSchema({ name: 'AircraftTypeView' })
export class AircraftTypeViewDto implements AircraftTypeView {
  @IdProperty()
  id: number;

  @IdProperty({ description: 'The ship it belongs to.' })
  shipId: number;

  @ApiProperty()
  designation: string;

  @ApiProperty()
  name: string;

  @EnumProperty(AIRCRAFT_CLASSES, 'AircraftClass', {
    description: "Which of the ship profile's departures its aircraft fly.",
  })
  aircraftClass: AircraftClass;

  @IntProperty({ minimum: 0, description: 'Pounds.' })
  maxGrossWeightLb: number;

  @IntProperty({
    nullable: true,
    description: 'Operating weight with crew, empty of fuel and stores, pounds; null until entered.',
  })
  operatingWeightLb: number | null;

  @ApiProperty({ description: 'Knots.' })
  crosswindLimitKt: number;

  @ApiProperty({ description: 'Pounds-force.' })
  thrustLbf: number;

  @ApiProperty({ description: 'Knots.' })
  requiredExcessKt: number;

  @IntProperty({ nullable: true, description: 'Pounds; null when the type never needs afterburner.' })
  afterburnerFromLb: number | null;

  @ApiProperty({
    type: 'number',
    nullable: true,
    description:
      'Overstress limit, knots; a shot giving more is refused. Null only for a type entered before the field existed: its shots are refused until entered.',
  })
  maxEndSpeedKt: number | null;

  @ApiProperty({
    type: 'string',
    nullable: true,
    description: 'The holdback release element the type is launched with; null until entered.',
  })
  holdbackElement: string | null;

  @ApiProperty({ type: [TrimBandDto] })
  trimBands: TrimBand[];

  @ApiProperty({ type: [LaunchTableRowDto] })
  launchTable: LaunchTableRow[];

  @ApiProperty({ type: [StoresItemDto], description: 'Ordered by name.' })
  storesCatalogue: StoresItem[];

  @ApiProperty({
    type: [SettingTableDto],
    description: 'The approved catapult settings; by catapult, then configuration.',
  })
  settingTables: SettingTable[];
}

@ApiSchema({ name: 'AircraftView' })
export class AircraftViewDto implements AircraftView {
  @IdProperty()
  id: number;

  @ApiProperty()
  sideNumber: string;

  @IdProperty()
  typeId: number;

  @ApiProperty()
  typeDesignation: string;

  @IdProperty()
  squadronId: number;

  @ApiProperty()
  squadronCode: string;

  @ApiProperty({ description: 'Where it is parked, a deck spot name.' })
  parkedSpot: string;

  @ApiProperty()
  serviceable: boolean;

  @IntProperty({ minimum: 0 })
  catapultShots: number;
}

@ApiSchema({ name: 'UserView' })
export class UserViewDto implements UserView {
  @IdProperty()
  id: number;

  @ApiProperty({ format: 'email' })
  email: string;

  @ApiProperty()
  name: string;

  @EnumProperty(ROLES, 'Role')
  role: Role;

  @IdProperty({ nullable: true })
  catapultId: number | null;

  @IdProperty({ nullable: true })
  squadronId: number | null;

  @ApiProperty()
  active: boolean;
}

export const UserPageDto = PageDto(UserViewDto, 'User', 'One page of the people, by name.');

export const AircraftPageDto = PageDto(AircraftViewDto, 'Aircraft', 'One page of the aircraft, by side number.');
