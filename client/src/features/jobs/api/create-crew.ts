import type { CrewView, createCrewRequestSchema } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '@/lib/api-client';
import { crewsQueryKey } from './get-crews';

export type CreateCrewRequest = z.output<typeof createCrewRequestSchema>;

export function createCrew(request: CreateCrewRequest): Promise<CrewView> {
  return api.post<CrewView>('/crews', request);
}

export function useCreateCrew() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCrew,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: crewsQueryKey }),
  });
}
