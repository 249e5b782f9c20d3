import type { INestApplication } from '@nestjs/common';
import { AIR_OPS, HANDLER, LineupDriver, OBSERVER, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('fuel on board and stores of a slot', () => {
  let app: INestApplication;
  let deck: LineupDriver;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  const setLoad = async (cycleId: number, slotId: number, body: object, by = HANDLER) => {
    const slot = await deck.slot(cycleId, slotId);
    return deck.call(by, 'post', `/api/cycles/${cycleId}/lineup/slots/${slotId}/load`, {
      slotVersion: slot.version,
      ...body,
    });
  };

  it('builds the planned gross weight from the operating weight, the fuel and the stores, and shows the parts', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C21');
    const response = await setLoad(
      cycle.id,
      slot.id,
      {
        fuelLb: 11_500,
        stores: [
          { name: 'Rocket pod', count: 2 },
          { name: 'drop tank', count: 1 },
        ],
      },
      AIR_OPS,
    );
    expect(response.status).toBe(200);
    // Hand computation, with the demo seed's WKD-41 (operating weight with crew 29,400 lb; rocket pod
    // 520 lb each; drop tank 1,240 lb each):
    //   stores  2 × 520 = 1,040; 1 × 1,240 = 1,240; 1,040 + 1,240 = 2,280 lb
    //   gross   29,400 + 11,500 + 2,280 = 43,180 lb
    expect(response.body.change.summary).toBe(
      'C21: fuel 11,500 lb, stores 2 × Rocket pod, 1 × Drop tank; planned weight 43,180 lb',
    );
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
      fuelLb: 11_500,
      stores: '2 × Rocket pod, 1 × Drop tank',
      grossWeightLb: 43_180, // hand computation above
      grossWeightParts: {
        operatingWeightLb: 29_400,
        fuelLb: 11_500,
        stores: [
          { name: 'Rocket pod', weightEachLb: 520, count: 2, weightLb: 1_040 }, // hand computation above
          { name: 'Drop tank', weightEachLb: 1_240, count: 1, weightLb: 1_240 }, // hand computation above
        ],
        storesWeightLb: 2_280, // hand computation above
        grossWeightLb: 43_180, // hand computation above
      },
    });
  });

  it('takes the catapult work back for re-verify when the fuel changes after the weight was agreed', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C22', { pilotEmail: pilot(6) });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    expect((await setLoad(cycle.id, slot.id, { fuelLb: 9_000, stores: [] })).status).toBe(200);
    // Agreed on the built weight: 29,400 + 9,000 = 38,400 lb (hand computation).
    expect((await deck.readyToLaunch(cycle.id, slot.id, pilot(6))).agreedWeightLb).toBe(38_400);

    // A hot refuel: 2,000 lb more. 29,400 + 11,000 = 40,400 lb (hand computation).
    const refuelled = await setLoad(cycle.id, slot.id, { fuelLb: 11_000, stores: [] });
    expect(refuelled.status).toBe(200);
    expect(refuelled.body.change.summary).toBe(
      'C22: fuel 11,000 lb, stores Clean; planned weight 40,400 lb; re-verify: C22 to on catapult',
    );
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
      status: 'on_catapult',
      grossWeightLb: 40_400,
      agreedWeightLb: null,
      pilotWeightAckLb: null,
      reverifyCause: 'weight',
    });
  });

  it.each([
    [
      'a stores item not in the type’s catalogue',
      { fuelLb: 9_000, stores: [{ name: 'Cargo pannier', count: 1 }] },
      400,
      'stores_not_in_catalogue',
      'Cargo pannier is not in the stores catalogue of WKD-41, so C23 cannot carry it.',
    ],
    ['negative fuel', { fuelLb: -1, stores: [] }, 400, 'validation_failed', 'fuel on board cannot be negative'],
    [
      'a count of 0',
      { fuelLb: 9_000, stores: [{ name: 'Rocket pod', count: 0 }] },
      400,
      'validation_failed',
      'the count of a stores line is at least 1; leave the item out to load none',
    ],
  ])('refuses %s and changes nothing', async (_case, body, status, code, message) => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C23');
    const response = await setLoad(cycle.id, slot.id, body);
    expect(response.status).toBe(status);
    expect(response.body.code).toBe(code);
    expect(response.body.message).toContain(message);
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
      version: slot.version,
      fuelLb: slot.fuelLb,
      grossWeightLb: slot.grossWeightLb,
      grossWeightParts: null,
    });
  });

  it('is not the observer’s to set', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C24');
    expect((await setLoad(cycle.id, slot.id, { fuelLb: 9_000, stores: [] }, OBSERVER)).status).toBe(403);
  });
});
