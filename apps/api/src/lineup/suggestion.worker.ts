import { LaunchMathInputError, suggestLineup, type LineupSuggestion, type SuggestionInput } from '@catline/launch-math';

/** What the worker hands back: a thrown error loses its class on the way, so a refusal is sent as data. */
export type SuggestionOutcome = { readonly suggestion: LineupSuggestion } | { readonly refusal: string };

/** Runs in a worker thread of {@link SuggestionPool}: the search takes longer than the API's thread may be held. */
export default function suggestInWorker(input: SuggestionInput): SuggestionOutcome {
  try {
    return { suggestion: suggestLineup(input) };
  } catch (error) {
    if (error instanceof LaunchMathInputError) return { refusal: error.message };
    throw error;
  }
}
