import type { Takeoff } from '@pondwright/shared/engine';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Runs the takeoff on the server, the authority; a 400 carries one message per field in `details`. */
export function computeTakeoffOnServer(input: unknown): Promise<Takeoff> {
  return api.post<Takeoff>('/takeoff', input);
}

export function useComputeTakeoffOnServer() {
  return useMutation({ mutationFn: computeTakeoffOnServer });
}
