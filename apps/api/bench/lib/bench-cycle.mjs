// Builds the benchmarks' own cycle: 40 aircraft in the deck pool of a fresh planning cycle.
import { apiClient, expectOk, signIn } from './http.mjs';

export const BENCH_AIRCRAFT = 40;

export async function createBenchCycle(baseUrl) {
  const admin = apiClient(baseUrl, await signIn(baseUrl, 'admin@catline.example'));
  const airops = apiClient(baseUrl, await signIn(baseUrl, 'airops@catline.example'));
  const [ship] = expectOk(await admin.get('/ships'), 'list ships');
  const types = expectOk(await admin.get('/aircraft-types'), 'list types');
  const squadrons = expectOk(await admin.get('/squadrons'), 'list squadrons');
  let aircraft = expectOk(await admin.get('/aircraft?limit=200'), 'list aircraft').items;
  const strike = types.reduce((a, b) => (a.maxGrossWeightLb < b.maxGrossWeightLb && a.afterburnerFromLb ? a : b));
  for (let n = 0; aircraft.length < BENCH_AIRCRAFT; n += 1) {
    expectOk(
      await admin.post('/aircraft', {
        sideNumber: `B${50 + n}`,
        typeId: strike.id,
        squadronId: squadrons[n % squadrons.length].id,
        parkedSpot: ship.deckSpots[n % ship.deckSpots.length].name,
      }),
      'add aircraft',
    );
    aircraft = expectOk(await admin.get('/aircraft?limit=200'), 'list aircraft').items;
  }
  const cycles = expectOk(await airops.get('/cycles?limit=200'), 'list cycles').items;
  const start = Date.now() + 3_600_000;
  const cycle = expectOk(
    await airops.post('/cycles', {
      shipId: ship.id,
      number: Math.max(0, ...cycles.map((c) => c.number)) + 1,
      plannedLaunchAt: new Date(start).toISOString(),
      windowStartAt: new Date(start - 300_000).toISOString(),
      windowEndAt: new Date(start + 1_800_000).toISOString(),
      shipCourseDeg: 90,
      shipSpeedKt: 24,
      trueWindFromDeg: 90,
      trueWindSpeedKt: 10,
      temperatureC: 18,
      pressureHpa: 1013.25,
      weatherCase: 'I',
      night: false,
    }),
    'create cycle',
  );
  // Pilots for as many aircraft as there are: only an aircraft with one may join a lane.
  const pilots = expectOk(await airops.get('/users/pilots?limit=200'), 'list pilots').items;
  for (const [i, plane] of aircraft.slice(0, BENCH_AIRCRAFT).entries()) {
    const type = types.find((t) => t.id === plane.typeId);
    const weights = type.launchTable.map((row) => row.grossWeightLb);
    expectOk(
      await airops.post(`/cycles/${cycle.id}/slots`, {
        aircraftId: plane.id,
        pilotId: pilots[i]?.id ?? null,
        mission: 'bench',
        fuelLb: 9_000,
        stores: '',
        grossWeightLb: Math.round((weights[0] + weights[weights.length - 1]) / 2),
        tanker: i === 0,
        earlyWarning: false,
        spare: i >= BENCH_AIRCRAFT - 2,
      }),
      'add slot',
    );
  }
  return cycle.id;
}
