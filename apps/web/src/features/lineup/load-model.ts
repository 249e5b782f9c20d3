import {
  FUEL_LB,
  type SetLoadRequest,
  STORES_COUNT,
  STORES_LINES_MAX,
  type SlotStoresLine,
  type StoresItem,
} from '@catline/contracts';
import { grossWeightBuildUp, pounds, type GrossWeightBuildUp } from '@catline/launch-math';

/** A stores row of the load form: a catalogue item and how many are loaded, as typed ('0' for none). */
export interface DraftStoresRow {
  name: string;
  weightEachLb: number;
  count: string;
  /** False for an item loaded before the admin took it out of the catalogue: the server refuses it. */
  inCatalogue: boolean;
}

/** One row per item of the type's catalogue with the count loaded now, then any loaded item it lost. */
export function draftStoresRows(catalogue: StoresItem[], loaded: SlotStoresLine[]): DraftStoresRow[] {
  const countOf = new Map(loaded.map((line) => [line.name.toLocaleLowerCase('en'), line.count]));
  const rows = catalogue.map((item) => ({
    ...item,
    count: String(countOf.get(item.name.toLocaleLowerCase('en')) ?? 0),
    inCatalogue: true,
  }));
  const listed = new Set(catalogue.map((item) => item.name.toLocaleLowerCase('en')));
  const gone = loaded
    .filter((line) => !listed.has(line.name.toLocaleLowerCase('en')))
    .map((line) => ({
      name: line.name,
      weightEachLb: line.weightEachLb,
      count: String(line.count),
      inCatalogue: false,
    }));
  return [...rows, ...gone];
}

const wholeIn = (text: string, min: number, max: number) => {
  const value = Number(text);
  return text.trim() !== '' && Number.isInteger(value) && value >= min && value <= max ? value : null;
};

/**
 * The load as the request without its version, or the first problem in words: fuel in whole pounds and
 * each count a whole number (0 leaves the item out), within the limits the server keeps.
 */
export function parseLoad(
  fuel: string,
  rows: DraftStoresRow[],
): { load: Omit<SetLoadRequest, 'slotVersion'> } | { problem: string } {
  const fuelLb = wholeIn(fuel, FUEL_LB.min, FUEL_LB.max);
  if (fuelLb === null) return { problem: `Enter the fuel on board in whole pounds, ${FUEL_LB.min} to ${FUEL_LB.max}.` };
  const stores: SetLoadRequest['stores'] = [];
  for (const row of rows) {
    const count = wholeIn(row.count, 0, STORES_COUNT.max);
    if (count === null) return { problem: `Enter how many ${row.name} as a whole number, 0 to ${STORES_COUNT.max}.` };
    if (count > 0) stores.push({ name: row.name, count });
  }
  if (stores.length > STORES_LINES_MAX)
    return { problem: `An aircraft carries at most ${STORES_LINES_MAX} kinds of stores.` };
  return { load: { fuelLb, stores } };
}

/** The planned weight the server will build from this load (launch-math's build-up), for the form to show. */
export function previewWeight(
  operatingWeightLb: number,
  load: Omit<SetLoadRequest, 'slotVersion'>,
  rows: DraftStoresRow[],
): GrossWeightBuildUp {
  const weightOf = new Map(rows.map((row) => [row.name, row.weightEachLb]));
  return grossWeightBuildUp({
    operatingWeight: pounds(operatingWeightLb),
    fuel: pounds(load.fuelLb),
    stores: load.stores.map(({ name, count }) => ({ name, weightEach: pounds(weightOf.get(name) ?? 0), count })),
  });
}
