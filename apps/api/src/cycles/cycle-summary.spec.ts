import { LAUNCH_CAUTION, zoneName } from '@catline/contracts';
import { composeCycleSummary, type CycleSummaryInput, type SummarySlot } from './cycle-summary.js';

const at = (time: string) => new Date(`2026-05-04T${time}Z`);
const slot = (id: number, sideNumber: string, squadronId: number, fields: Partial<SummarySlot> = {}): SummarySlot => ({
  id,
  sideNumber,
  typeDesignation: 'WKD-41',
  squadronId,
  mission: 'Strike training',
  pilotName: null,
  status: 'launched',
  catapultNumber: 1,
  launchedAt: at('14:01:05'),
  replacedBy: null,
  ...fields,
});

const input: CycleSummaryInput = {
  shipName: 'Brindlemark',
  hullCode: 'DKT 3',
  cycleNumber: 7,
  // +04:00 all year (IANA tz database, "Zone Asia/Dubai ... 4:00 - +04"): 14:00Z is 18:00 on board.
  timeZone: 'Asia/Dubai',
  plannedLaunchAt: at('14:00:00'),
  windowStartAt: at('13:50:00'),
  windowEndAt: at('14:35:00'),
  weatherCase: 'I',
  night: false,
  slots: [
    slot(1, 'C21', 1, { pilotName: 'Kit Marrowby' }),
    slot(2, 'C24', 1, { status: 'down', catapultNumber: null, launchedAt: null, replacedBy: 'C31' }),
    slot(3, 'C31', 1, { mission: 'Spare', catapultNumber: 3, launchedAt: at('14:03:40') }),
    slot(4, 'C25', 1, { status: 'scratched', catapultNumber: null, launchedAt: null }),
    slot(5, 'D33', 2, { catapultNumber: 2, launchedAt: at('14:00:20') }),
  ],
  events: [
    { at: at('13:58:02'), slotId: 2, summary: 'C24 down; spare C31 takes cat 3, place 2' },
    { at: at('14:00:10'), slotId: 5, summary: 'D33 suspended on cat 2: Launch bar not seated' },
  ],
};

describe('composeCycleSummary', () => {
  it("lists the squadron's own aircraft with their outcome, the cycle's totals and what happened to them", () => {
    const mail = composeCycleSummary(input, {
      id: 1,
      name: 'Cinderwrights',
      code: 'CWR',
      email: 'cinderwrights@catline.example',
    });
    expect(mail.subject).toBe('Cycle 7 closed: Cinderwrights 2 of 4 launched');
    // The zone's short name is Intl's to give ("GST" or "GMT+4"); the clock figures are worked by hand.
    const zone = zoneName('Asia/Dubai');
    expect(mail.text.split('\n')).toEqual([
      'Cycle 7 of Brindlemark (DKT 3) is closed.',
      `Planned launch 2026-05-04 18:00 ${zone} (window 17:50 ${zone} to 18:35 ${zone}), case I, day.`,
      `Whole cycle: 3 of 5 aircraft launched, first at 18:00:20 ${zone}, last at 18:03:40 ${zone}.`,
      '',
      'Cinderwrights (CWR): 2 of 4 launched',
      `  C21  WKD-41  Strike training  Kit Marrowby    launched 18:01:05 ${zone} from cat 1`,
      '  C24  WKD-41  Strike training  no pilot named  down, replaced by C31',
      `  C31  WKD-41  Spare            no pilot named  launched 18:03:40 ${zone} from cat 3`,
      '  C25  WKD-41  Strike training  no pilot named  not launched (scratched when the cycle closed)',
      '',
      'What happened to these aircraft:',
      `  17:58:02 ${zone}  C24 down; spare C31 takes cat 3, place 2`,
      '',
      `Sent by Catline when the cycle closed. ${LAUNCH_CAUTION}`,
      '',
    ]);
  });

  it("leaves out other squadrons' aircraft and events", () => {
    const mail = composeCycleSummary(input, {
      id: 2,
      name: 'Driftmenders',
      code: 'DFM',
      email: 'driftmenders@catline.example',
    });
    expect(mail.subject).toBe('Cycle 7 closed: Driftmenders 1 of 1 launched');
    expect(mail.text).toContain('D33 suspended on cat 2: Launch bar not seated');
    expect(mail.text).not.toContain('C21');
  });
});
