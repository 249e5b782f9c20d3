import type { DeckLayout, DeckSpot, Role, ShipProfile } from '@catline/contracts';
import { demoSettingTables } from './demo-setting-tables.js';
import { demoCatapults } from './demo-fleet.js';

// A second, smaller invented ship, so the demo (and the role matrix) shows that a ship's people see and
// change only their own ship's data. Invented like the rest of the demo; demo-names.spec.ts checks its
// names too. Its people sign in with the demo password.

export const secondShip = {
  name: 'Quillmoor',
  hullCode: 'DKT 7',
  pairGapS: 12,
  profile: {
    clearingTurnDeg: { bow: 8, waist: -8 },
    departures: {
      I: {
        jet: 'Quillmoor house departure, Case I jets (invented for the demo): after the clearing turn hold 700 ft to 4 nm, then climb on your own to the briefed block.',
        turboprop:
          'Quillmoor house departure, Case I turboprops (invented for the demo): after the clearing turn hold 500 ft to 4 nm, then climb on your own to the briefed block.',
        helicopter:
          'Quillmoor house departure, Case I helicopters (invented for the demo): lift, clear to starboard and hold 300 ft inside 2 nm until the tower releases you.',
      },
      II: {
        jet: 'Quillmoor house departure, Case II jets (invented for the demo): hold 700 ft on the ship’s heading to 4 nm, call the departure desk, climb on the heading it gives.',
        turboprop:
          'Quillmoor house departure, Case II turboprops (invented for the demo): hold 500 ft on the ship’s heading to 4 nm, call the departure desk, climb on the heading it gives.',
        helicopter:
          'Quillmoor house departure, Case II helicopters (invented for the demo): lift to 300 ft on the starboard quarter and call the departure desk before leaving 2 nm.',
      },
      III: {
        jet: 'Quillmoor house departure, Case III jets (invented for the demo): climb at once to 1,500 ft on the ship’s heading; at 4 nm take the heading the departure desk gives.',
        turboprop:
          'Quillmoor house departure, Case III turboprops (invented for the demo): climb at once to 1,000 ft on the ship’s heading; at 4 nm take the heading the departure desk gives.',
        helicopter:
          'Quillmoor house departure, Case III helicopters (invented for the demo): lift on instruments to 500 ft on the starboard quarter and stay inside 3 nm until the departure desk hands you on.',
      },
    },
    launchPrerequisites: ['Plane guard helicopter up', 'Deck swept', 'Fire party at the catapults'],
  } satisfies ShipProfile,
};

/** Two bow catapults, as the first ship's. */
export const secondShipCatapults = demoCatapults.filter((catapult) => catapult.position === 'bow');

export const secondShipDeckSpots: DeckSpot[] = [1, 2, 3, 4].map((n) => ({
  name: `row-${n}`,
  taxiS: { 1: 40 + 10 * n, 2: 50 + 10 * n },
}));

/** One elevator to one hangar bay; no landing area over the catapults. */
export const secondShipDeckLayout: DeckLayout = {
  elevators: [{ name: 'lift', cycleS: 55, taxiS: { 1: 70, 2: 60 } }],
  hangarBays: [{ name: 'bay', elevators: ['lift'] }],
  landingAreaCatapults: [],
};

export const secondShipSquadrons = [{ code: 'HLW', name: 'Hollowlarks', email: 'hollowlarks@catline.example' }];

export const secondShipAircraftTypes = [
  {
    designation: 'PVK-12',
    name: 'Pennyvale trainer jet',
    aircraftClass: 'jet' as const,
    operatingWeightLb: 14_500,
    maxGrossWeightLb: 24_000,
    crosswindLimitKt: 12,
    thrustLbf: 14_000,
    requiredExcessKt: 10,
    afterburnerFromLb: null,
    maxEndSpeedKt: 160,
    holdbackElement: 'RE-11',
    trimBands: [{ upToLb: null, trimDeg: 9 }],
    launchTable: [
      { grossWeightLb: 16_000, minLaunchAirspeedKt: 108 },
      { grossWeightLb: 24_000, minLaunchAirspeedKt: 122 },
    ],
    storesCatalogue: [{ name: 'Practice bomb', weightEachLb: 30 }],
    settingTables: demoSettingTables(
      secondShipCatapults,
      {
        bow: [
          [18_000, 0],
          [20_000, 0],
          [22_000, 0],
          [24_000, 1],
        ],
        waist: [],
      },
      10,
    ),
  },
];

export const secondShipAircraft = [1, 2, 3, 4].map((n) => ({
  sideNumber: `H${70 + n}`,
  designation: 'PVK-12',
  squadron: 'HLW',
  parkedSpot: `row-${n}`,
}));

interface SecondShipPerson {
  email: string;
  name: string;
  role: Role;
  catapultNumber?: number;
  squadron?: string;
}

/** One person of each role the matrix calls, at addresses of their own (`<role>@quillmoor.catline.example`). */
export const secondShipPeople: SecondShipPerson[] = [
  { email: 'admin@quillmoor.catline.example', name: 'Wren Oakhollow', role: 'admin' },
  { email: 'airops@quillmoor.catline.example', name: 'Sela Brimcote', role: 'air_operations' },
  { email: 'airboss@quillmoor.catline.example', name: 'Hal Tennerby', role: 'air_boss' },
  { email: 'handler@quillmoor.catline.example', name: 'Ode Farrowlane', role: 'handler' },
  { email: 'cat@quillmoor.catline.example', name: 'Vin Castlemire', role: 'catapult_officer', catapultNumber: 1 },
  { email: 'deo@quillmoor.catline.example', name: 'Ysa Pembridge', role: 'deck_edge_operator', catapultNumber: 1 },
  { email: 'pilot@quillmoor.catline.example', name: 'Cal Drummoral', role: 'pilot', squadron: 'HLW' },
  { email: 'observer@quillmoor.catline.example', name: 'Bea Lintonvale', role: 'observer' },
];

/** The fleet admin: an admin of no one ship, who works on every ship's data. */
export const fleetAdmin = { email: 'fleet@catline.example', name: 'Ines Harrowgate', role: 'admin' as const };
