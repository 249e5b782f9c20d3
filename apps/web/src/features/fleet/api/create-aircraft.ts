import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftView, CreateAircraftRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { fleetKeys } from './fleet-keys.js';

export const createAircraft = (request: CreateAircraftRequest) =>
  apiRequest<AircraftView>('/aircraft', { method: 'POST', body: request });

export function useCreateAircraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAircraft,
    onSettled: () => queryClient.invalidateQueries({ queryKey: fleetKeys.aircraft.all }),
  });
}
