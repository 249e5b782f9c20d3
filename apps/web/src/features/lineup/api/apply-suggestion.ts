import type { ApplySuggestionRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export const applySuggestion = (cycleId: number, request: ApplySuggestionRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/suggestion/apply`, { method: 'POST', body: request });

export const useApplySuggestion = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (request: ApplySuggestionRequest) => applySuggestion(cycleId, request) });
