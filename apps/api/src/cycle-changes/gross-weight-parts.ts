import type { GrossWeightPartsView } from '@catline/contracts';
import { grossWeightBuildUp, pounds } from '@catline/launch-math';
import type { StoredLoadBuild } from '../database/entities/slot.entity.js';

/**
 * The planned gross weight of a slot with its parts, from launch-math's build-up over what the load
 * was set with (the operating weight of that time, so the parts keep adding up to the stored figure).
 */
export function grossWeightParts(fuelLb: number, build: StoredLoadBuild): GrossWeightPartsView {
  const weight = grossWeightBuildUp({
    operatingWeight: pounds(build.operatingWeightLb),
    fuel: pounds(fuelLb),
    stores: build.stores.map(({ name, weightEachLb, count }) => ({ name, weightEach: pounds(weightEachLb), count })),
  });
  return {
    operatingWeightLb: weight.operatingWeight,
    fuelLb: weight.fuel,
    stores: weight.stores.map((line) => ({
      name: line.name,
      weightEachLb: line.weightEach,
      count: line.count,
      weightLb: line.weight,
    })),
    storesWeightLb: weight.storesWeight,
    grossWeightLb: weight.grossWeight,
  };
}
