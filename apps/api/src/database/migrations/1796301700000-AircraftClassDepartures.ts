import { MigrationInterface, QueryRunner } from 'typeorm';

const CLASSES = ['jet', 'turboprop', 'helicopter'] as const;

type Departures = Record<string, unknown>;

/** Rewrites every ship profile's departures with `change`; the profiles are JSON, so the rows are read and written back. */
async function rewriteDepartures(queryRunner: QueryRunner, change: (departures: Departures) => Departures) {
  const ships: { id: number; profile: string | { departures: Departures } }[] = await queryRunner.query(
    'SELECT `id`, `profile` FROM `ships`',
  );
  for (const ship of ships) {
    const profile = typeof ship.profile === 'string' ? JSON.parse(ship.profile) : ship.profile;
    profile.departures = change(profile.departures);
    await queryRunner.query('UPDATE `ships` SET `profile` = ? WHERE `id` = ?', [JSON.stringify(profile), ship.id]);
  }
}

export class AircraftClassDepartures1796301700000 implements MigrationInterface {
  name = 'AircraftClassDepartures1796301700000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Every existing type becomes a jet: until now each class flew the one text per case, which the profile
    // below gives to every class, so no pilot's departure changes until the admin sets a type's class.
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` ADD \`aircraft_class\` varchar(12) NOT NULL DEFAULT 'jet'`);
    await rewriteDepartures(queryRunner, (departures) =>
      Object.fromEntries(
        Object.entries(departures).map(([weatherCase, text]) => [
          weatherCase,
          typeof text === 'string' ? Object.fromEntries(CLASSES.map((aircraftClass) => [aircraftClass, text])) : text,
        ]),
      ),
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    // One text per case again: the jets' text, the one every existing type flew before.
    await rewriteDepartures(queryRunner, (departures) =>
      Object.fromEntries(
        Object.entries(departures).map(([weatherCase, byClass]) => [
          weatherCase,
          typeof byClass === 'string' ? byClass : (byClass as Record<string, string>).jet,
        ]),
      ),
    );
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` DROP COLUMN \`aircraft_class\``);
  }
}
