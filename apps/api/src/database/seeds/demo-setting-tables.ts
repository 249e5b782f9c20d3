import type { CatapultPosition, SettingTable } from '@catline/contracts';

/** [up to lb, setting] rows of a clean aircraft, by rising weight. */
type DemoRows = readonly (readonly [number, number])[];

/**
 * Invented approved settings for every catapult of a ship and both configurations: a bow and a waist
 * table per type, and carrying stores takes one setting more (the demo's rule, for drag).
 */
export function demoSettingTables(
  catapults: readonly { number: number; position: CatapultPosition }[],
  rows: Record<CatapultPosition, DemoRows>,
  recommendedExcessKt: number,
): SettingTable[] {
  return catapults.flatMap((catapult) =>
    (['clean', 'stores'] as const).map((configuration) => ({
      catapultNumber: catapult.number,
      configuration,
      recommendedExcessKt,
      rows: rows[catapult.position].map(([upToLb, setting]) => ({
        upToLb,
        setting: configuration === 'stores' ? setting + 1 : setting,
      })),
    })),
  );
}
