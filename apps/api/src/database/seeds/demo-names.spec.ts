import { demoAircraft, demoAircraftTypes, demoPeople, demoShip, demoSquadrons } from './demo-fleet.js';
import {
  fleetAdmin,
  secondShip,
  secondShipAircraft,
  secondShipAircraftTypes,
  secondShipPeople,
  secondShipSquadrons,
} from './demo-second-ship.js';

const ships = [demoShip, secondShip];
const squadrons = [...demoSquadrons, ...secondShipSquadrons];
const types = [...demoAircraftTypes, ...secondShipAircraftTypes];
const aircraft = [...demoAircraft, ...secondShipAircraft];
const people = [...demoPeople, ...secondShipPeople, fleetAdmin];

// The demo must read as invented to someone from the trade. These lists of real names, written from
// memory, stay here in the test and never reach the UI; a demo name that matches one (or sits one
// letter away from it) fails.

/** Aircraft carriers and other warships, past and present. */
const REAL_SHIPS = [
  'Enterprise',
  'Nimitz',
  'Forrestal',
  'Essex',
  'Lexington',
  'Saratoga',
  'Yorktown',
  'Hornet',
  'Midway',
  'Ranger',
  'Independence',
  'Kitty Hawk',
  'Constellation',
  'America',
  'Intrepid',
  'Wasp',
  'Langley',
  'Oriskany',
  'Ticonderoga',
  'Coral Sea',
  'Shangri-La',
  'Bon Homme Richard',
  'Carl Vinson',
  'Theodore Roosevelt',
  'Abraham Lincoln',
  'George Washington',
  'John C. Stennis',
  'Harry S. Truman',
  'Ronald Reagan',
  'Gerald R. Ford',
  'John F. Kennedy',
  'Queen Elizabeth',
  'Prince of Wales',
  'Ark Royal',
  'Illustrious',
  'Invincible',
  'Hermes',
  'Eagle',
  'Victorious',
  'Formidable',
  'Indomitable',
  'Implacable',
  'Glorious',
  'Courageous',
  'Furious',
  'Ocean',
  'Bulwark',
  'Albion',
  'Centaur',
  'Halcyon',
  'Charles de Gaulle',
  'Clemenceau',
  'Foch',
  'Bearn',
  'Kuznetsov',
  'Liaoning',
  'Shandong',
  'Fujian',
  'Vikramaditya',
  'Vikrant',
  'Viraat',
  'Cavour',
  'Garibaldi',
  'Juan Carlos',
  'Principe de Asturias',
  'Sao Paulo',
  'Minas Gerais',
  'Akagi',
  'Kaga',
  'Shokaku',
  'Zuikaku',
  'Hiryu',
  'Soryu',
  'Izumo',
];

/** Squadron names of navies and air arms, and their nicknames. */
const REAL_SQUADRONS = [
  'Jolly Rogers',
  'Black Knights',
  'Tomcatters',
  'Redcockers',
  'Golden Warriors',
  'Sunliners',
  'Blacklions',
  'Swordsmen',
  'Diamondbacks',
  'Tophatters',
  'Mighty Shrikes',
  'Rampagers',
  'Gunslingers',
  'Stingers',
  'Argonauts',
  'Bounty Hunters',
  'Blue Blasters',
  'Checkmates',
  'Warhawks',
  'Screwtops',
  'Sun Kings',
  'Black Eagles',
  'Liberty Bells',
  'Wallbangers',
  'Bear Aces',
  'Seahawks',
  'Greyhawks',
  'Tigertails',
  'Golden Hawks',
  'Rawhides',
  'Providers',
  'Blue Angels',
  'Red Arrows',
  'Immortals',
  'Vigilantes',
  'Knighthawks',
  'Royal Maces',
  'Fist of the Fleet',
];

/** Names of naval and other well-known aircraft, historic ones included. */
const REAL_AIRCRAFT_NAMES = [
  'Nightjar',
  'Heron',
  'Kestrel',
  'Harrier',
  'Sea Harrier',
  'Sea Fury',
  'Sea Vixen',
  'Sea Hawk',
  'Buccaneer',
  'Gannet',
  'Scimitar',
  'Wyvern',
  'Firefly',
  'Seafire',
  'Corsair',
  'Hellcat',
  'Wildcat',
  'Bearcat',
  'Tigercat',
  'Skyhawk',
  'Skyraider',
  'Phantom',
  'Crusader',
  'Tomcat',
  'Super Hornet',
  'Growler',
  'Prowler',
  'Intruder',
  'Vigilante',
  'Hawkeye',
  'Greyhound',
  'Viking',
  'Tracker',
  'Trader',
  'Demon',
  'Cutlass',
  'Banshee',
  'Panther',
  'Cougar',
  'Fury',
  'Skyray',
  'Skyknight',
  'Savage',
  'Rafale',
  'Etendard',
  'Alize',
  'Flanker',
  'Swordfish',
  'Albacore',
  'Barracuda',
  'Avenger',
  'Dauntless',
  'Helldiver',
  'Devastator',
  'Buffalo',
  'Vindicator',
  'Goshawk',
  'Lightning',
  'Sea King',
];

/** Type designations, written as their owners write them. */
const REAL_DESIGNATIONS = [
  'KS-3',
  'S-3',
  'E-2',
  'E-2D',
  'C-2',
  'F-14',
  'F/A-18',
  'EA-18G',
  'EA-6B',
  'A-6',
  'A-7',
  'A-4',
  'F-4',
  'F-8',
  'F-35C',
  'T-45',
  'KC-135',
  'E-3',
  'RV-3',
  'RV-4',
  'RV-6',
  'RV-7',
  'RV-8',
  'RV-10',
  'MJ-2',
  'KR-2',
  'VP-1',
  'KJ-600',
  'J-15',
  'Su-33',
  'MiG-29K',
  'Yak-38',
  'Ka-27',
  'Be-12',
  'AV-8B',
  'MV-22',
  'CMV-22',
  'MQ-25',
  'SH-60',
  'MH-60R',
];

/** Letters that start real designations: the US tri-service missions and their modifiers, and others in use. */
const REAL_DESIGNATION_PREFIXES = [
  'A',
  'B',
  'C',
  'E',
  'F',
  'K',
  'P',
  'R',
  'S',
  'T',
  'U',
  'V',
  'X',
  'KS',
  'KC',
  'KA',
  'EA',
  'EC',
  'EP',
  'ES',
  'FA',
  'RA',
  'RF',
  'RV',
  'SH',
  'MH',
  'TA',
  'AV',
  'MV',
  'MQ',
  'RQ',
  'KJ',
  'J',
  'SU',
  'MIG',
  'YAK',
  'KA',
  'BE',
  'MJ',
  'KR',
];

/** Hull classification symbols and pennant letters of carriers and flat-decked ships. */
const REAL_HULL_SYMBOLS = [
  'CV',
  'CVN',
  'CVA',
  'CVS',
  'CVL',
  'CVE',
  'CVB',
  'CVT',
  'CVAN',
  'CVH',
  'LHA',
  'LHD',
  'LPH',
  'R',
  'DDH',
];

/** Public figures, living and historic, naval aviation's own among them. */
const PUBLIC_FIGURES = [
  'Rui Tavares',
  'Chester Nimitz',
  'William Halsey',
  'Raymond Spruance',
  'Marc Mitscher',
  'Hyman Rickover',
  'Elmo Zumwalt',
  'John McCain',
  'Neil Armstrong',
  'John Glenn',
  'Alan Shepard',
  'Jim Lovell',
  'Eugene Ely',
  'Grace Hopper',
  "Butch O'Hare",
  'Jimmy Thach',
  'Eric Brown',
  'Kara Hultgreen',
  'Ted Williams',
  'George H. W. Bush',
];

const words = (text: string) =>
  text
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter(Boolean);
const singular = (word: string) => word.replace(/s$/, '');
const compact = (text: string) => text.toUpperCase().replace(/[^A-Z0-9]/g, '');

/** Edits (insert, delete, substitute) between two strings. */
function distance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++)
      current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    previous = current;
  }
  return previous[b.length];
}

/** The real names a demo name copies: the whole name inside it, or one of its words a letter from a one-word name. */
function realNamesIn(name: string, realNames: string[]): string[] {
  const demoWords = words(name).map(singular);
  const demoPhrase = ` ${demoWords.join(' ')} `;
  return realNames.filter((real) => {
    const realWords = words(real).map(singular);
    if (demoPhrase.includes(` ${realWords.join(' ')} `)) return true;
    return realWords.length === 1 && demoWords.some((word) => word.length >= 4 && distance(word, realWords[0]) <= 1);
  });
}

const letterPrefix = (code: string) => code.toUpperCase().match(/^[A-Z]+/)?.[0] ?? '';

const NAMED: [kind: string, name: string][] = [
  ...ships.map((ship): [string, string] => ['ship', ship.name]),
  ...squadrons.map((squadron): [string, string] => ['squadron', squadron.name]),
  ...types.map((type): [string, string] => ['aircraft type', type.name]),
];

describe('the demo reads as invented', () => {
  it.each(NAMED)('the %s %s is no real ship, squadron or aircraft', (_kind, name) => {
    expect(realNamesIn(name, [...REAL_SHIPS, ...REAL_SQUADRONS, ...REAL_AIRCRAFT_NAMES])).toEqual([]);
  });

  it.each(types.map((type) => type.designation))(
    'the designation %s is no real one and uses no real prefix',
    (designation) => {
      expect(REAL_DESIGNATIONS.filter((real) => distance(compact(real), compact(designation)) <= 1)).toEqual([]);
      expect(REAL_DESIGNATION_PREFIXES).not.toContain(letterPrefix(designation));
    },
  );

  it.each(ships.map((ship) => ship.name))('gives the %s a hull code that is no real classification', (name) => {
    expect(REAL_HULL_SYMBOLS).not.toContain(letterPrefix(ships.find((ship) => ship.name === name)!.hullCode));
  });

  it('numbers the aircraft in its own scheme: a letter, then two digits; never the three-digit numbers of real air wings', () => {
    for (const plane of aircraft) {
      expect(plane.sideNumber).toMatch(/^[A-Z]\d{2}$/);
    }
    expect(new Set(aircraft.map((plane) => plane.sideNumber)).size).toBe(aircraft.length);
  });

  it.each(people.map((person) => person.name))('%s is no public figure', (name) => {
    expect(PUBLIC_FIGURES.filter((figure) => compact(figure) === compact(name))).toEqual([]);
    const surname = words(name).at(-1)!;
    expect(PUBLIC_FIGURES.filter((figure) => words(figure).at(-1) === surname)).toEqual([]);
  });

  it.each(['I', 'II', 'III'] as const)('labels every Case %s departure as the invented ship’s own', (weatherCase) => {
    for (const ship of ships)
      for (const text of Object.values(ship.profile.departures[weatherCase]))
        expect(text).toMatch(/invented for the demo/);
  });

  it('catches the names the demo used to carry', () => {
    expect(realNamesIn('Nightjars', REAL_AIRCRAFT_NAMES)).toEqual(['Nightjar']);
    expect(realNamesIn('Brass Herons', REAL_AIRCRAFT_NAMES)).toEqual(['Heron']);
    expect(realNamesIn('Halcyon Reach', REAL_SHIPS)).toEqual(['Halcyon']);
    expect(REAL_DESIGNATIONS.filter((real) => distance(compact(real), compact('KS-7')) <= 1)).toEqual(['KS-3']);
    expect(REAL_DESIGNATION_PREFIXES).toContain(letterPrefix('RV-3'));
    expect(REAL_HULL_SYMBOLS).toContain(letterPrefix('CVT-9'));
  });
});
