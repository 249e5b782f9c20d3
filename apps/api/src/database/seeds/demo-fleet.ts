import type { DeckLayout, DeckSpot, LaunchTableRow, Role, ShipProfile, StoresItem, TrimBand } from '@catline/contracts';
import { demoSettingTables } from './demo-setting-tables.js';

// The invented demo scenario: a fictional training carrier, its squadrons and aircraft types.
// Every name and number here is made up for the demo; none is real launch data. The hull code, the
// type designations and the side numbers follow schemes of our own, not any service's, and the
// departures are the invented ship's own procedures, not published ones.
// demo-names.spec.ts checks these names against real ones.

export const demoShip = {
  name: 'Brindlemark',
  hullCode: 'DKT 3',
  pairGapS: 10,
  profile: {
    clearingTurnDeg: { bow: 10, waist: -10 },
    departures: {
      I: {
        jet: 'Brindlemark house departure, Case I jets (invented for the demo): after the clearing turn hold 800 ft to the Lantern gate, 5 nm out on the launch side of the bow; from the gate climb on your own to the briefed block, clear of the ship’s 3 nm ring.',
        turboprop:
          'Brindlemark house departure, Case I turboprops (invented for the demo): after the clearing turn hold 600 ft and 200 kt to the Lantern gate, then climb on your own to the briefed block, staying below the jets’ 800 ft lane until 5 nm.',
        helicopter:
          'Brindlemark house departure, Case I helicopters (invented for the demo): lift, slide clear to the side the handler signals, then hold 300 ft on the port quarter inside 2 nm until the tower releases you.',
      },
      II: {
        jet: 'Brindlemark house departure, Case II jets (invented for the demo): after the clearing turn hold 800 ft on the ship’s heading to 5 nm, call "gate" to the ship’s departure desk, then climb on the heading the desk gives to the briefed block.',
        turboprop:
          'Brindlemark house departure, Case II turboprops (invented for the demo): after the clearing turn hold 600 ft on the ship’s heading to 5 nm, call "gate" to the departure desk and climb at 200 kt on the heading it gives.',
        helicopter:
          'Brindlemark house departure, Case II helicopters (invented for the demo): lift and hold 300 ft on the port quarter, call the departure desk and leave the 2 nm ring only on the heading it gives.',
      },
      III: {
        jet: 'Brindlemark house departure, Case III jets (invented for the demo): no turn off the catapult; climb at once to 1,500 ft on the ship’s heading; at 4 nm take the heading the departure desk gives, climb to the briefed block and report level.',
        turboprop:
          'Brindlemark house departure, Case III turboprops (invented for the demo): no turn off the catapult; climb at once to 1,000 ft on the ship’s heading; at 4 nm take the heading the departure desk gives and report level.',
        helicopter:
          'Brindlemark house departure, Case III helicopters (invented for the demo): lift on instruments to 200 ft, then 500 ft on the port quarter; stay on the departure desk’s frequency and inside 3 nm until it hands you on.',
      },
    },
    // The ship's own list, invented for the demo.
    launchPrerequisites: [
      'Plane guard helicopter up and on station',
      'Flight deck swept for loose gear',
      'Crash and salvage crews at their posts',
      'No-load test shots fired on every catapult',
    ],
  } satisfies ShipProfile,
};

export const demoCatapults = [
  {
    number: 1,
    position: 'bow',
    axisAngleDeg: 1.5,
    strokeM: 94,
    energyMinMj: 18,
    energyMaxMj: 96,
    settingCount: 40,
    resetIntervalS: 55,
    pair: 1,
  },
  {
    number: 2,
    position: 'bow',
    axisAngleDeg: -1.5,
    strokeM: 94,
    energyMinMj: 18,
    energyMaxMj: 96,
    settingCount: 40,
    resetIntervalS: 55,
    pair: 1,
  },
  {
    number: 3,
    position: 'waist',
    axisAngleDeg: -7.5,
    strokeM: 90,
    energyMinMj: 16,
    energyMaxMj: 90,
    settingCount: 40,
    resetIntervalS: 65,
    pair: 2,
  },
  {
    number: 4,
    position: 'waist',
    axisAngleDeg: -9,
    strokeM: 90,
    energyMinMj: 16,
    energyMaxMj: 90,
    settingCount: 40,
    resetIntervalS: 65,
    pair: 2,
  },
] as const;

/**
 * Taxi times in seconds from each spot to catapults 1 to 4, spots grouped in four deck areas. Two rows
 * hold one aircraft behind another: aft-4 waits for aft-3, stern-2 for stern-1. All invented.
 */
export const demoDeckSpots: DeckSpot[] = [
  ...[1, 2, 3, 4].map((n) => ({
    name: `bow-${n}`,
    area: 'Bow',
    taxiS: { 1: 60 + n * 10, 2: 50 + n * 10, 3: 150, 4: 170 },
  })),
  ...[1, 2, 3, 4].map((n) => ({
    name: `mid-${n}`,
    area: 'Midships',
    taxiS: { 1: 110, 2: 100, 3: 80 + n * 5, 4: 90 + n * 5 },
  })),
  ...[1, 2, 3, 4].map((n) => ({
    name: `aft-${n}`,
    area: 'Aft',
    ...(n === 4 ? { clearBefore: ['aft-3'] } : {}),
    taxiS: { 1: 180, 2: 170, 3: 90 + n * 10, 4: 80 + n * 10 },
  })),
  ...[1, 2].map((n) => ({
    name: `stern-${n}`,
    area: 'Stern',
    ...(n === 2 ? { clearBefore: ['stern-1'] } : {}),
    taxiS: { 1: 220, 2: 210, 3: 130, 4: 120 },
  })),
];

/** Two elevators (a trip up or down takes 50 and 65 s) serving two hangar bays; invented. */
export const demoDeckLayout: DeckLayout = {
  elevators: [
    { name: 'lift-fwd', cycleS: 50, taxiS: { 1: 90, 2: 80, 3: 140, 4: 150 } },
    { name: 'lift-aft', cycleS: 65, taxiS: { 1: 200, 2: 190, 3: 100, 4: 90 } },
  ],
  hangarBays: [
    { name: 'bay-A', elevators: ['lift-fwd', 'lift-aft'] },
    { name: 'bay-B', elevators: ['lift-aft'] },
  ],
  landingAreaCatapults: [3, 4],
};

export const demoSquadrons = [
  { code: 'CWR', name: 'Cinderwrights', email: 'cinderwrights@catline.example' },
  { code: 'DFM', name: 'Driftmenders', email: 'driftmenders@catline.example' },
  { code: 'GSB', name: 'Gorsebinders', email: 'gorsebinders@catline.example' },
  { code: 'LNB', name: 'Lanternbearers', email: 'lanternbearers@catline.example' },
];

const strikeTrim: TrimBand[] = [
  { upToLb: 44_000, trimDeg: 15 },
  { upToLb: 48_000, trimDeg: 17 },
  { upToLb: null, trimDeg: 18 },
];

/** Invented items and weights; each catalogue ordered by name, as the API keeps it. */
const strikeStores: StoresItem[] = [
  { name: 'Drop tank', weightEachLb: 1_240 },
  { name: 'Practice bomb', weightEachLb: 30 },
  { name: 'Refuelling store', weightEachLb: 1_980 },
  { name: 'Rocket pod', weightEachLb: 520 },
  { name: 'Training round', weightEachLb: 190 },
];

export const demoAircraftTypes = [
  {
    designation: 'WKD-41',
    name: 'Wickerbolt strike jet',
    aircraftClass: 'jet' as const,
    maxGrossWeightLb: 51_000,
    operatingWeightLb: 29_400,
    crosswindLimitKt: 15,
    thrustLbf: 26_000,
    requiredExcessKt: 12,
    afterburnerFromLb: 46_000,
    maxEndSpeedKt: 190,
    holdbackElement: 'RE-14',
    trimBands: strikeTrim,
    launchTable: [
      { grossWeightLb: 34_000, minLaunchAirspeedKt: 124 },
      { grossWeightLb: 40_000, minLaunchAirspeedKt: 133 },
      { grossWeightLb: 46_000, minLaunchAirspeedKt: 143 },
      { grossWeightLb: 51_000, minLaunchAirspeedKt: 151 },
    ] satisfies LaunchTableRow[],
    storesCatalogue: strikeStores,
    settingTables: demoSettingTables(
      demoCatapults,
      {
        bow: [
          [36_000, 7],
          [38_000, 9],
          [40_000, 11],
          [42_000, 14],
          [44_000, 16],
          [46_000, 19],
          [48_000, 22],
          [50_000, 25],
          [51_000, 27],
        ],
        waist: [
          [36_000, 9],
          [38_000, 11],
          [40_000, 13],
          [42_000, 16],
          [44_000, 19],
          [46_000, 22],
          [48_000, 25],
          [50_000, 28],
          [51_000, 29],
        ],
      },
      12,
    ),
  },
  {
    designation: 'MSD-26',
    name: 'Mistlewing light attack',
    aircraftClass: 'jet' as const,
    maxGrossWeightLb: 31_000,
    operatingWeightLb: 16_800,
    crosswindLimitKt: 12,
    thrustLbf: 17_500,
    requiredExcessKt: 10,
    afterburnerFromLb: 28_000,
    maxEndSpeedKt: 165,
    holdbackElement: 'RE-9',
    trimBands: [
      { upToLb: 26_000, trimDeg: 10 },
      { upToLb: null, trimDeg: 12 },
    ],
    launchTable: [
      { grossWeightLb: 20_000, minLaunchAirspeedKt: 112 },
      { grossWeightLb: 25_000, minLaunchAirspeedKt: 121 },
      { grossWeightLb: 31_000, minLaunchAirspeedKt: 133 },
    ],
    storesCatalogue: [
      { name: 'Drop tank', weightEachLb: 980 },
      { name: 'Practice bomb', weightEachLb: 30 },
      { name: 'Rocket pod', weightEachLb: 520 },
    ] satisfies StoresItem[],
    settingTables: demoSettingTables(
      demoCatapults,
      {
        bow: [
          [22_000, 0],
          [24_000, 0],
          [26_000, 2],
          [28_000, 4],
          [30_000, 6],
          [31_000, 7],
        ],
        waist: [
          [22_000, 0],
          [24_000, 1],
          [26_000, 3],
          [28_000, 5],
          [30_000, 7],
          [31_000, 8],
        ],
      },
      10,
    ),
  },
  {
    designation: 'FGD-63',
    name: 'Farglass early warning',
    aircraftClass: 'turboprop' as const,
    maxGrossWeightLb: 56_000,
    operatingWeightLb: 39_500,
    crosswindLimitKt: 20,
    thrustLbf: 11_000,
    requiredExcessKt: 10,
    afterburnerFromLb: null,
    maxEndSpeedKt: 150,
    holdbackElement: 'RE-22',
    trimBands: [{ upToLb: null, trimDeg: 6 }],
    launchTable: [
      { grossWeightLb: 44_000, minLaunchAirspeedKt: 104 },
      { grossWeightLb: 50_000, minLaunchAirspeedKt: 111 },
      { grossWeightLb: 56_000, minLaunchAirspeedKt: 119 },
    ],
    storesCatalogue: [{ name: 'Cargo pannier', weightEachLb: 260 }] satisfies StoresItem[],
    settingTables: demoSettingTables(
      demoCatapults,
      {
        bow: [
          [46_000, 8],
          [48_000, 9],
          [50_000, 11],
          [52_000, 13],
          [54_000, 15],
          [56_000, 17],
        ],
        waist: [
          [46_000, 9],
          [48_000, 11],
          [50_000, 13],
          [52_000, 15],
          [54_000, 17],
          [56_000, 19],
        ],
      },
      10,
    ),
  },
];

const spots = demoDeckSpots.map((spot) => spot.name);
/**
 * The demo's own side numbers: the squadron's letter, then the airframe's number in the air wing,
 * counted on from squadron to squadron.
 */
const fleetOf = (
  letter: string,
  first: number,
  count: number,
  designation: string,
  squadron: string,
  spotOffset: number,
) =>
  Array.from({ length: count }, (_, i) => ({
    sideNumber: `${letter}${first + i}`,
    designation,
    squadron,
    parkedSpot: spots[(spotOffset + i) % spots.length],
  }));

export const demoAircraft = [
  ...fleetOf('C', 21, 12, 'WKD-41', 'CWR', 0),
  ...fleetOf('D', 33, 10, 'WKD-41', 'DFM', 5),
  ...fleetOf('G', 43, 4, 'MSD-26', 'GSB', 9),
  ...fleetOf('L', 47, 3, 'FGD-63', 'LNB', 12),
];

interface DemoPerson {
  email: string;
  name: string;
  role: Role;
  catapultNumber?: number;
  squadron?: string;
}

export const demoPeople: DemoPerson[] = [
  { email: 'admin@catline.example', name: 'Ada Tollingrave', role: 'admin' },
  { email: 'airops@catline.example', name: 'Priya Quennevar', role: 'air_operations' },
  { email: 'airboss@catline.example', name: 'Bram Osterwick', role: 'air_boss' },
  { email: 'handler@catline.example', name: 'Tomas Ebberhold', role: 'handler' },
  ...[1, 2, 3, 4].map((n) => ({
    email: `cat${n}@catline.example`,
    name: ['Lia Corrimand', 'Sam Dellavint', 'Ines Ashwicke', 'Hanne Brenlowe'][n - 1],
    role: 'catapult_officer' as const,
    catapultNumber: n,
  })),
  ...[1, 2].map((n) => ({
    email: `deo${n}@catline.example`,
    name: ['Rune Halsworthy', 'Ama Quillbrook'][n - 1],
    role: 'deck_edge_operator' as const,
    catapultNumber: n,
  })),
  { email: 'pilot@catline.example', name: 'Kit Marrowby', role: 'pilot', squadron: 'CWR' },
  ...[
    'Jo Fettleworth',
    'Mika Grennadine',
    'Dev Hollowmere',
    'Noor Inchwhistle',
    'Ezra Jessamont',
    'Tess Kilvarren',
    'Ravi Lowenthorpe',
    'Lou Nimblethorn',
    // Enough pilots for every aircraft the browser tests put in the catapults' orders (16 at most).
    'Ines Ottercombe',
    'Bram Pellowdine',
    'Sade Quarrington',
    'Finn Rushbeck',
    'Lena Sallowby',
    'Omar Thistlewick',
    'Pia Umberfield',
    'Cato Varrowmere',
    'Nell Wendlebury',
    'Ivo Yarrowdale',
    'Rhea Zeldercott',
    'Joss Abbotsfell',
    'Mira Brackenshaw',
    'Teo Cindleford',
    'Una Dapplewick',
  ].map((name, i) => ({
    email: `pilot${i + 2}@catline.example`,
    name,
    role: 'pilot' as const,
    squadron: demoSquadrons[i % demoSquadrons.length].code,
  })),
  { email: 'observer@catline.example', name: 'Oren Pellicott', role: 'observer' },
];
