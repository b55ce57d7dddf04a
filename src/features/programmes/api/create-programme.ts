import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ProgrammeInput } from '@shared/schemas/programmes';
import type { ProgrammeView } from '@shared/views/programme';
import { api } from '@/lib/api-client';
import { programmeKeys } from './programme-keys';

export const createProgramme = (input: ProgrammeInput) => api.post<{ programme: ProgrammeView }>('/api/programmes', input);

export function useCreateProgramme() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createProgramme, onSuccess: () => queryClient.invalidateQueries({ queryKey: programmeKeys.all }) });
}
