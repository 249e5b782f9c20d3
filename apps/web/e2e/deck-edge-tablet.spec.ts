import { expect, test } from '@playwright/test';
import { apiAs, changesOf, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { approvedSetting, card, catFigure, lane, openAs } from './support/screens.js';

const DECK_EDGE_TABLET = { width: 1024, height: 768 };
const PILOT_TABLET = { width: 820, height: 1180 };
// What the live feed brings to another screen may take a while on a loaded machine.
const LIVE = { timeout: 10_000 };

/** The approved setting the server works out for the aircraft now, as the station shows it. */
async function settingOnServer(cycleId: number, side: string) {
  const observer = await apiAs('observer');
  const slot = (await lineupOf(observer, cycleId)).slots.find((candidate) => candidate.sideNumber === side)!;
  await observer.dispose();
  expect(slot.figures?.catapultSetting, `an approved setting for ${side}`).not.toBeNull();
  return String(slot.figures!.catapultSetting);
}

test('the deck edge operator launches from a touch tablet an aircraft whose pilot corrects the weight from theirs; the setting follows the agreed weight and the board and the pilot follow live', async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const { cycle, slotIds } = await planCycle({
    start: true,
    aircraft: [{ side: 'C21', grossWeightLb: 40_000, pilot: 'pilot' }],
  });
  const handlerApi = await apiAs('handler');
  await placeInLane(handlerApi, cycle.id, slotIds.get('C21')!, 1);
  await handlerApi.dispose();

  const board = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  const pilot = await openAs(browser, 'pilot', `/my-launch?cycle=${cycle.id}`, PILOT_TABLET, true);
  const station = await openAs(browser, 'deo1', `/cat-station?cycle=${cycle.id}`, DECK_EDGE_TABLET, true);
  for (const screen of [board, pilot, station]) {
    await expect(screen.getByTestId('connection-state')).toHaveAttribute('data-state', 'live', LIVE);
  }
  await expect(station.getByRole('heading', { name: 'Cat station · Cat 1' })).toBeVisible();
  await expect(station.getByTestId('current-aircraft')).toHaveAttribute('data-side-number', 'C21');
  const boardCard = card(lane(board, 1), 'C21');
  await expect(boardCard).toHaveAttribute('data-status', 'planned');

  const step = (name: string) => station.getByTestId(`step-${name}`);
  const tapStep = async (name: string) => {
    await step(name).tap();
    await expect(step(name)).toHaveAttribute('data-done', 'true', LIVE);
  };

  await tapStep('taxiing');
  // The crew fits the holdback release element the type needs (the demo's invented designations).
  await expect(station.getByTestId('holdback-element')).toHaveText(/^Holdback: RE-\d+$/);
  await tapStep('on_catapult');
  await expect(boardCard).toHaveAttribute('data-status', 'on_catapult', LIVE);
  await expect(pilot.getByTestId('slot-status')).toHaveText('On catapult', LIVE);
  await expect(station.getByTestId('pilot-weight')).toContainText('Show the pilot 40,000 lb');

  const plannedSetting = await settingOnServer(cycle.id, 'C21');
  await expect(approvedSetting(station)).toHaveText(plannedSetting);
  await expect(catFigure(station, 'Gross weight (planned)')).toHaveText('40,000 lb');

  // The pilot holds 3,500 lb more than the plan and answers it from the tablet.
  await pilot.getByTestId('weight-correction').fill('43,500');
  await pilot.getByTestId('answer-weight').tap();
  await expect(pilot.getByTestId('weight-acknowledged')).toContainText('You answered 43,500 lb', LIVE);
  await expect(station.getByTestId('pilot-weight')).toHaveText(
    'The pilot answers 43,500 lb (planned 40,000 lb).',
    LIVE,
  );
  await expect(step('weight_agreed')).toHaveText('Weight agreed: 43,500 lb');
  // Answered, not yet agreed: the setting stays the planned weight's until the crew records the figure.
  await expect(approvedSetting(station)).toHaveText(plannedSetting);

  await tapStep('weight_agreed');
  await expect(step('weight_agreed')).toHaveText('✓ Weight agreed: 43,500 lb');
  await expect(approvedSetting(station)).not.toHaveText(plannedSetting, LIVE);
  const agreedSetting = await settingOnServer(cycle.id, 'C21');
  expect(agreedSetting).not.toBe(plannedSetting);
  await expect(approvedSetting(station)).toHaveText(agreedSetting);
  // The weight beside the setting is the one it was worked out for.
  await expect(catFigure(station, 'Gross weight (agreed)')).toHaveText('43,500 lb');
  await expect(pilot.getByTestId('weight-agreed')).toHaveText('Agreed with the crew: 43,500 lb.', LIVE);
  // One tap on the plan's figure would take the agreement back: only a typed figure may still be answered.
  await expect(pilot.getByTestId('acknowledge-weight')).toBeHidden();
  await expect(pilot.getByRole('region', { name: 'Gross weight' })).toContainText('Gross weight agreed43,500 lb');
  await expect(pilot.getByTestId('weight-correction')).toBeVisible();
  await expect(pilot.getByTestId('slot-status')).toHaveText('Weight agreed', LIVE);
  await expect(boardCard).toHaveAttribute('data-status', 'weight_agreed', LIVE);

  // The two-person check: the figure typed from the console must be the approved setting for 43,500 lb.
  const readBack = station.getByTestId('setting-read-back-input');
  await expect(step('setting_set')).toBeDisabled();
  await readBack.fill(String(Number(agreedSetting) + 1));
  await step('setting_set').tap();
  await expect(station.getByTestId('notice')).toContainText(
    `The console reads ${Number(agreedSetting) + 1}, but the approved setting for C21 at 43,500 lb is ${agreedSetting}`,
  );
  await expect(step('setting_set')).not.toHaveAttribute('data-done');
  await readBack.fill(agreedSetting);
  await tapStep('setting_set');
  await expect(step('setting_set')).toHaveText(`✓ Setting set and read back: ${agreedSetting}`);
  for (const name of ['deflector_up', 'tensioned', 'run_up', 'checks_clear', 'pilot_ready']) {
    await tapStep(name);
  }
  await expect(boardCard).toHaveAttribute('data-status', 'pilot_ready', LIVE);
  await expect(pilot.getByTestId('slot-status')).toHaveText('Pilot ready', LIVE);

  await expect(station.getByTestId('launch')).toBeEnabled();
  await station.getByTestId('launch').tap();
  await expect(boardCard).toHaveAttribute('data-status', 'launched', LIVE);
  await expect(pilot.getByTestId('slot-status')).toHaveText('Launched', LIVE);
  await expect(station.getByText('No aircraft waiting on cat 1')).toBeVisible(LIVE);

  // The change log keeps both figures and who agreed: the deck edge operator.
  const observer = await apiAs('observer');
  const changes = await changesOf(observer, cycle.id);
  await observer.dispose();
  const agreement = changes.find((change) => change.summary.startsWith('C21 weight agreed'));
  expect(agreement?.summary).toBe('C21 weight agreed on cat 1: 43,500 lb (planned 40,000 lb)');
  expect(agreement?.actor.role).toBe('deck_edge_operator');
  const launches = changes.filter((change) => change.kind === 'slot_launched');
  expect(launches).toHaveLength(1);
  expect(launches[0].actor.role).toBe('deck_edge_operator');
});
