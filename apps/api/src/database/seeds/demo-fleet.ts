import type { DeckSpot, LaunchTableRow, Role, ShipProfile, TrimBand } from '@catline/contracts';

// The invented demo scenario: a fictional training carrier, its squadrons and aircraft types.
// Every name and number here is made up for the demo; none is real launch data.

export const DEMO_PASSWORD = 'catline-demo';

export const demoShip = {
  name: 'Halcyon Reach',
  hullCode: 'CVT-9',
  pairGapS: 10,
  profile: {
    clearingTurnDeg: { bow: 10, waist: -10 },
    departures: {
      I: 'After the clearing turn, parallel the base recovery course at 500 ft until 7 nm, then climb unrestricted in visual conditions.',
      II: 'Straight ahead to 7 nm at 500 ft, then climb on the assigned departure radial under departure control.',
      III: 'Straight ahead, climb to 1,000 ft; at 7 nm turn to the assigned departure radial under positive control.',
    },
  } satisfies ShipProfile,
};

export const demoCatapults = [
  { number: 1, position: 'bow', axisAngleDeg: 1.5, strokeM: 94, energyMinMj: 18, energyMaxMj: 96, settingCount: 40, resetIntervalS: 55, pair: 1 },
  { number: 2, position: 'bow', axisAngleDeg: -1.5, strokeM: 94, energyMinMj: 18, energyMaxMj: 96, settingCount: 40, resetIntervalS: 55, pair: 1 },
  { number: 3, position: 'waist', axisAngleDeg: -7.5, strokeM: 90, energyMinMj: 16, energyMaxMj: 90, settingCount: 40, resetIntervalS: 65, pair: 2 },
  { number: 4, position: 'waist', axisAngleDeg: -9, strokeM: 90, energyMinMj: 16, energyMaxMj: 90, settingCount: 40, resetIntervalS: 65, pair: 2 },
] as const;

/** Taxi times in seconds from each parking area to catapults 1 to 4. */
export const demoDeckSpots: DeckSpot[] = [
  ...[1, 2, 3, 4].map((n) => ({ name: `bow-${n}`, taxiS: { 1: 60 + n * 10, 2: 50 + n * 10, 3: 150, 4: 170 } })),
  ...[1, 2, 3, 4].map((n) => ({ name: `mid-${n}`, taxiS: { 1: 110, 2: 100, 3: 80 + n * 5, 4: 90 + n * 5 } })),
  ...[1, 2, 3, 4].map((n) => ({ name: `aft-${n}`, taxiS: { 1: 180, 2: 170, 3: 90 + n * 10, 4: 80 + n * 10 } })),
  ...[1, 2].map((n) => ({ name: `stern-${n}`, taxiS: { 1: 220, 2: 210, 3: 130, 4: 120 } })),
];

export const demoSquadrons = [
  { code: 'TDC', name: 'Tidecallers', email: 'tidecallers@catline.example' },
  { code: 'BRH', name: 'Brass Herons', email: 'brass-herons@catline.example' },
  { code: 'NJR', name: 'Nightjars', email: 'nightjars@catline.example' },
  { code: 'LNB', name: 'Lanternbearers', email: 'lanternbearers@catline.example' },
];

const strikeTrim: TrimBand[] = [
  { upToLb: 44_000, trimDeg: 15 },
  { upToLb: 48_000, trimDeg: 17 },
  { upToLb: null, trimDeg: 18 },
];

export const demoAircraftTypes = [
  {
    designation: 'KS-7',
    name: 'Kestrin strike fighter',
    maxGrossWeightLb: 51_000,
    crosswindLimitKt: 15,
    thrustLbf: 26_000,
    requiredExcessKt: 12,
    afterburnerFromLb: 46_000,
    trimBands: strikeTrim,
    launchTable: [
      { grossWeightLb: 34_000, minLaunchAirspeedKt: 124 },
      { grossWeightLb: 40_000, minLaunchAirspeedKt: 133 },
      { grossWeightLb: 46_000, minLaunchAirspeedKt: 143 },
      { grossWeightLb: 51_000, minLaunchAirspeedKt: 151 },
    ] satisfies LaunchTableRow[],
  },
  {
    designation: 'LT-5',
    name: 'Larkspur light attack',
    maxGrossWeightLb: 31_000,
    crosswindLimitKt: 12,
    thrustLbf: 17_500,
    requiredExcessKt: 10,
    afterburnerFromLb: 28_000,
    trimBands: [
      { upToLb: 26_000, trimDeg: 10 },
      { upToLb: null, trimDeg: 12 },
    ],
    launchTable: [
      { grossWeightLb: 20_000, minLaunchAirspeedKt: 112 },
      { grossWeightLb: 25_000, minLaunchAirspeedKt: 121 },
      { grossWeightLb: 31_000, minLaunchAirspeedKt: 133 },
    ],
  },
  {
    designation: 'RV-3',
    name: 'Vireo early warning',
    maxGrossWeightLb: 56_000,
    crosswindLimitKt: 20,
    thrustLbf: 11_000,
    requiredExcessKt: 10,
    afterburnerFromLb: null,
    trimBands: [{ upToLb: null, trimDeg: 6 }],
    launchTable: [
      { grossWeightLb: 44_000, minLaunchAirspeedKt: 104 },
      { grossWeightLb: 50_000, minLaunchAirspeedKt: 111 },
      { grossWeightLb: 56_000, minLaunchAirspeedKt: 119 },
    ],
  },
];

const spots = demoDeckSpots.map((spot) => spot.name);
const fleetOf = (first: number, count: number, designation: string, squadron: string, spotOffset: number) =>
  Array.from({ length: count }, (_, i) => ({
    sideNumber: String(first + i),
    designation,
    squadron,
    parkedSpot: spots[(spotOffset + i) % spots.length],
  }));

export const demoAircraft = [
  ...fleetOf(101, 12, 'KS-7', 'TDC', 0),
  ...fleetOf(201, 10, 'KS-7', 'BRH', 5),
  ...fleetOf(301, 4, 'LT-5', 'NJR', 9),
  ...fleetOf(601, 3, 'RV-3', 'LNB', 12),
];

interface DemoPerson {
  email: string;
  name: string;
  role: Role;
  catapultNumber?: number;
  squadron?: string;
}

export const demoPeople: DemoPerson[] = [
  { email: 'admin@catline.example', name: 'Ada Marlowe', role: 'admin' },
  { email: 'airops@catline.example', name: 'Priya Vennard', role: 'air_operations' },
  { email: 'handler@catline.example', name: 'Tomas Achterberg', role: 'handler' },
  ...[1, 2, 3, 4].map((n) => ({
    email: `cat${n}@catline.example`,
    name: ['Lia Okonkwo', 'Sam Falkner', 'Rui Tavares', 'Hanne Lindqvist'][n - 1],
    role: 'catapult_officer' as const,
    catapultNumber: n,
  })),
  { email: 'pilot@catline.example', name: 'Kit Rowan', role: 'pilot', squadron: 'TDC' },
  ...['Jo Abernathy', 'Mika Sorensen', 'Dev Aranda', 'Noor Halloran', 'Ezra Quill', 'Tess Varga', 'Ravi Osei', 'Lou Brandt']
    .map((name, i) => ({
      email: `pilot${i + 2}@catline.example`,
      name,
      role: 'pilot' as const,
      squadron: demoSquadrons[i % demoSquadrons.length].code,
    })),
  { email: 'observer@catline.example', name: 'Oren Castell', role: 'observer' },
];
