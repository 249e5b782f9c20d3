/** "weight_agreed" as a person reads it in a refusal or the change log: "weight agreed". */
export const statusWords = (status: string) => status.replaceAll('_', ' ');

/** A weight as the crew says it: "44,000 lb". */
export const lb = (weight: number) => `${weight.toLocaleString('en-US')} lb`;
