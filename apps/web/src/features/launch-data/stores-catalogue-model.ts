import {
  STORES_CATALOGUE_MAX_ITEMS,
  STORES_ITEM_NAME_MAX_LENGTH,
  STORES_ITEM_WEIGHT_LB,
  type StoresItem,
} from '@catline/contracts';

/** A catalogue line as typed. */
export interface DraftStoresItem {
  name: string;
  weightEachLb: string;
}

export const toDraftStores = (items: StoresItem[]): DraftStoresItem[] =>
  items.map((item) => ({ name: item.name, weightEachLb: String(item.weightEachLb) }));

/**
 * The catalogue as the request, or the first problem in words: a name each (unique regardless of
 * case, as the server keeps them) and a weight each in whole pounds within the shared limits.
 */
export function parseStoresCatalogue(drafts: DraftStoresItem[]): { items: StoresItem[] } | { problem: string } {
  if (drafts.length > STORES_CATALOGUE_MAX_ITEMS)
    return { problem: `A catalogue holds at most ${STORES_CATALOGUE_MAX_ITEMS} items.` };
  const items: StoresItem[] = [];
  const seen = new Set<string>();
  for (const [index, draft] of drafts.entries()) {
    const name = draft.name.trim();
    if (name === '' || name.length > STORES_ITEM_NAME_MAX_LENGTH)
      return { problem: `Item ${index + 1}: enter a name of up to ${STORES_ITEM_NAME_MAX_LENGTH} characters.` };
    const key = name.toLocaleLowerCase('en');
    if (seen.has(key)) return { problem: `Item ${index + 1}: ${name} is already in the catalogue.` };
    seen.add(key);
    const weightEachLb = Number(draft.weightEachLb);
    const { min, max } = STORES_ITEM_WEIGHT_LB;
    if (draft.weightEachLb.trim() === '' || !Number.isInteger(weightEachLb) || weightEachLb < min || weightEachLb > max)
      return { problem: `Item ${index + 1}: enter the weight of one ${name} in whole pounds, ${min} to ${max}.` };
    items.push({ name, weightEachLb });
  }
  return { items };
}
