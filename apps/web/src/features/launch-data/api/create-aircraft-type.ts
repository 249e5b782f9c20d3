import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftTypeView, CreateAircraftTypeRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { aircraftTypeKeys } from '../../../lib/queries/aircraft-types-query.js';

export const createAircraftType = (request: CreateAircraftTypeRequest) =>
  apiRequest<AircraftTypeView>('/aircraft-types', { method: 'POST', body: request });

export function useCreateAircraftType() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAircraftType,
    onSettled: () => queryClient.invalidateQueries({ queryKey: aircraftTypeKeys.all }),
  });
}
