import { composeCycleSummary, type CycleSummaryInput, type SummarySlot } from './cycle-summary.js';

const at = (time: string) => new Date(`2026-05-04T${time}Z`);
const slot = (id: number, sideNumber: string, squadronId: number, fields: Partial<SummarySlot> = {}): SummarySlot => ({
  id,
  sideNumber,
  typeDesignation: 'KS-7',
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
  shipName: 'Halcyon Reach',
  hullCode: 'CVT-9',
  cycleNumber: 7,
  plannedLaunchAt: at('14:00:00'),
  windowStartAt: at('13:50:00'),
  windowEndAt: at('14:35:00'),
  weatherCase: 'I',
  night: false,
  slots: [
    slot(1, '101', 1, { pilotName: 'Kit Rowan' }),
    slot(2, '104', 1, { status: 'down', catapultNumber: null, launchedAt: null, replacedBy: '111' }),
    slot(3, '111', 1, { mission: 'Spare', catapultNumber: 3, launchedAt: at('14:03:40') }),
    slot(4, '105', 1, { status: 'scratched', catapultNumber: null, launchedAt: null }),
    slot(5, '201', 2, { catapultNumber: 2, launchedAt: at('14:00:20') }),
  ],
  events: [
    { at: at('13:58:02'), slotId: 2, summary: '104 down; spare 111 takes cat 3, place 2' },
    { at: at('14:00:10'), slotId: 5, summary: '201 suspended on cat 2: Launch bar not seated' },
  ],
};

describe('composeCycleSummary', () => {
  it("lists the squadron's own aircraft with their outcome, the cycle's totals and what happened to them", () => {
    const mail = composeCycleSummary(input, { id: 1, name: 'Tidecallers', code: 'TDC', email: 'tidecallers@catline.example' });
    expect(mail.subject).toBe('Cycle 7 closed: Tidecallers 2 of 4 launched');
    expect(mail.text.split('\n')).toEqual([
      'Cycle 7 of Halcyon Reach (CVT-9) is closed.',
      'Planned launch 14:00Z (window 13:50Z to 14:35Z), case I, day.',
      'Whole cycle: 3 of 5 aircraft launched, first at 14:00:20Z, last at 14:03:40Z.',
      '',
      'Tidecallers (TDC): 2 of 4 launched',
      '  101  KS-7  Strike training  Kit Rowan       launched 14:01:05Z from cat 1',
      '  104  KS-7  Strike training  no pilot named  down, replaced by 111',
      '  111  KS-7  Spare            no pilot named  launched 14:03:40Z from cat 3',
      '  105  KS-7  Strike training  no pilot named  not launched (scratched when the cycle closed)',
      '',
      'What happened to these aircraft:',
      '  13:58:02Z  104 down; spare 111 takes cat 3, place 2',
      '',
      "Sent by Catline when the cycle closed. Catline is a planning and coordination aid: the ship's approved launch data, the catapult officers' checks and the ship's procedures govern every launch.",
      '',
    ]);
  });

  it("leaves out other squadrons' aircraft and events", () => {
    const mail = composeCycleSummary(input, { id: 2, name: 'Brass Herons', code: 'BRH', email: 'brass-herons@catline.example' });
    expect(mail.subject).toBe('Cycle 7 closed: Brass Herons 1 of 1 launched');
    expect(mail.text).toContain('201 suspended on cat 2: Launch bar not seated');
    expect(mail.text).not.toContain('101');
  });
});
