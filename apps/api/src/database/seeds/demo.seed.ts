import { DEMO_PASSWORD } from '@catline/contracts';
import type { DataSource } from 'typeorm';
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

/**
 * Seeds the fleet and people into an empty database in one transaction, then builds the demo cycles
 * through the lineup commands; returns false if a ship already exists.
 */
export async function seedDemo(dataSource: DataSource): Promise<boolean> {
  if ((await dataSource.getRepository(Ship).count()) > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const shipId = await dataSource.transaction(async (manager) => {
    const ship = await manager.save(Ship, { ...demoShip, deckSpots: demoDeckSpots, deckLayout: demoDeckLayout });
    const catapults = await manager.save(
      Catapult,
      demoCatapults.map((catapult) => ({ ...catapult, shipId: ship.id })),
    );
    const onShip = { shipId: ship.id };
    const squadrons = await manager.save(
      Squadron,
      demoSquadrons.map((squadron) => ({ ...squadron, ...onShip })),
    );
    const types = await manager.save(
      AircraftType,
      demoAircraftTypes.map((type) => ({ ...type, ...onShip })),
    );
    await manager.save(
      Aircraft,
      demoAircraft.map(({ designation, squadron, ...aircraft }) => ({
        ...aircraft,
        ...onShip,
        typeId: types.find((type) => type.designation === designation)!.id,
        squadronId: squadrons.find((s) => s.code === squadron)!.id,
      })),
    );
    await manager.save(
      User,
      demoPeople.map((person) => ({
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
  });
  await seedDemoCycles(dataSource, shipId);
  return true;
}
