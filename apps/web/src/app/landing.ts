import type { Role } from '@catline/contracts';

export interface Screen {
  path: string;
  label: string;
}

const screens = {
  lineup: { path: '/lineup', label: 'Lineup' },
  deck: { path: '/deck', label: 'Deck' },
  catStation: { path: '/cat-station', label: 'Cat station' },
  myLaunch: { path: '/my-launch', label: 'My launch' },
  cycles: { path: '/cycles', label: 'Cycles' },
  fleet: { path: '/fleet', label: 'Fleet' },
  launchData: { path: '/launch-data', label: 'Launch data' },
  people: { path: '/people', label: 'People' },
  reports: { path: '/reports', label: 'Reports' },
  audit: { path: '/audit', label: 'Audit' },
} satisfies Record<string, Screen>;

const shared = [screens.cycles, screens.fleet, screens.launchData, screens.reports];

/** Each role's screens, its main screen first: that is where it lands after signing in. */
export const SCREENS_BY_ROLE: Record<Role, Screen[]> = {
  handler: [screens.lineup, screens.deck, ...shared],
  catapult_officer: [screens.catStation, screens.lineup, ...shared],
  deck_edge_operator: [screens.catStation, screens.lineup, ...shared],
  pilot: [screens.myLaunch, screens.lineup, ...shared],
  air_operations: [screens.cycles, screens.lineup, screens.fleet, screens.launchData, screens.reports],
  // Primary flight control runs the launch from the board: prerequisites, deck status, start and stop.
  air_boss: [screens.lineup, screens.deck, ...shared],
  admin: [
    screens.people,
    screens.fleet,
    screens.launchData,
    screens.cycles,
    screens.lineup,
    screens.reports,
    screens.audit,
  ],
  observer: [screens.lineup, screens.deck, ...shared],
};

export const landingPath = (role: Role) => SCREENS_BY_ROLE[role][0].path;
