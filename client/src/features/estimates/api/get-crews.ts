import type { CrewView } from '@pondwright/shared';
import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/**
 * The crews a new job can go to. The jobs pages ask for the same list under the same key, so one
 * answer serves both; features do not import each other, hence this small copy.
 */
export const useCrewOptions = ({ enabled }: { enabled: boolean }) =>
  useQuery({
    queryKey: ['crews'],
    queryFn: () => api.get<CrewView[]>('/crews'),
    enabled,
  });
