import { DEMO_PASSWORD } from '@catline/contracts';
import type { DataSource, EntityManager } from 'typeorm';
import { AircraftType } from '../entities/aircraft-type.entity.js';
import { Aircraft } from '../entities/aircraft.entity.js';
import { hashPassword } from '../../auth/password.js';
import { Catapult } from '../entities/catapult.entity.js';
import { Ship } from '../entities/ship.entity.js';
import { Squadron } from '../entities/squadron.entity.js';
import { User } from '../entities/user.entity.js';
import { seedDemoCycles } from './demo-cycles.js';
import {
  demoAircraft,
  demoAircraftTypes,
  demoCatapults,
  demoDeckLayout,
  demoDeckSpots,
  demoPeople,
  demoShip,
  demoSquadrons,
} from './demo-fleet.js';
import {
  fleetAdmin,
  secondShip,
  secondShipAircraft,
  secondShipAircraftTypes,
  secondShipCatapults,
  secondShipDeckLayout,
  secondShipDeckSpots,
  secondShipPeople,
  secondShipSquadrons,
} from './demo-second-ship.js';

/** One ship of the demo with everything it owns, as demo-fleet.ts and demo-second-ship.ts write them. */
interface DemoShipData {
  ship: Pick<Ship, 'name' | 'hullCode' | 'pairGapS' | 'profile' | 'deckSpots' | 'deckLayout'>;
  catapults: readonly Omit<Catapult, 'id' | 'shipId' | 'ship' | 'shotCount' | 'status' | 'readinessSteps'>[];
  squadrons: readonly Pick<Squadron, 'code' | 'name' | 'email'>[];
  types: readonly Omit<AircraftType, 'id' | 'shipId' | 'ship'>[];
  aircraft: readonly { sideNumber: string; designation: string; squadron: string; parkedSpot: string }[];
  people: readonly { email: string; name: string; role: User['role']; catapultNumber?: number; squadron?: string }[];
}

async function seedShip(manager: EntityManager, data: DemoShipData, passwordHash: string): Promise<number> {
  const ship = await manager.save(Ship, data.ship);
  const onShip = { shipId: ship.id };
  const catapults = await manager.save(
    Catapult,
    data.catapults.map((catapult) => ({ ...catapult, ...onShip })),
  );
  const squadrons = await manager.save(
    Squadron,
    data.squadrons.map((squadron) => ({ ...squadron, ...onShip })),
  );
  const types = await manager.save(
    AircraftType,
    data.types.map((type) => ({ ...type, ...onShip })),
  );
  await manager.save(
    Aircraft,
    data.aircraft.map(({ designation, squadron, ...aircraft }) => ({
      ...aircraft,
      ...onShip,
      typeId: types.find((type) => type.designation === designation)!.id,
      squadronId: squadrons.find((s) => s.code === squadron)!.id,
    })),
  );
  await manager.save(
    User,
    data.people.map((person) => ({
      email: person.email,
      name: person.name,
      role: person.role,
      ...onShip,
      passwordHash,
      catapultId: catapults.find((c) => c.number === person.catapultNumber)?.id ?? null,
      squadronId: squadrons.find((s) => s.code === person.squadron)?.id ?? null,
    })),
  );
  return ship.id;
}

/**
 * Seeds the two ships, their fleets and people and the fleet admin into an empty database in one
 * transaction, then builds the first ship's demo cycles through the lineup commands; returns false if
 * a ship already exists. The first ship is the one every test and browser test works on.
 */
export async function seedDemo(dataSource: DataSource): Promise<boolean> {
  if ((await dataSource.getRepository(Ship).count()) > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const shipId = await dataSource.transaction(async (manager) => {
    const first = await seedShip(
      manager,
      {
        ship: { ...demoShip, deckSpots: demoDeckSpots, deckLayout: demoDeckLayout },
        catapults: demoCatapults,
        squadrons: demoSquadrons,
        types: demoAircraftTypes,
        aircraft: demoAircraft,
        people: demoPeople,
      },
      passwordHash,
    );
    await seedShip(
      manager,
      {
        ship: { ...secondShip, deckSpots: secondShipDeckSpots, deckLayout: secondShipDeckLayout },
        catapults: secondShipCatapults,
        squadrons: secondShipSquadrons,
        types: secondShipAircraftTypes,
        aircraft: secondShipAircraft,
        people: secondShipPeople,
      },
      passwordHash,
    );
    await manager.save(User, { ...fleetAdmin, shipId: null, passwordHash });
    return first;
  });
  await seedDemoCycles(dataSource, shipId);
  return true;
}
