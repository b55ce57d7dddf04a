import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AttachmentView } from '@shared/views/observation';
import { api } from '@/lib/api-client';
import { observationKeys } from './observation-keys';

/** Sends the files under the multipart field `files`; the server checks every file before it keeps any. */
export function uploadAttachments(observationId: number, files: File[]) {
  const form = new FormData();
  for (const file of files) form.append('files', file, file.name);
  return api.post<{ attachments: AttachmentView[] }>(`/api/observations/${observationId}/attachments`, form);
}

export function useUploadAttachments(observationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (files: File[]) => uploadAttachments(observationId, files),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: observationKeys.all }),
  });
}

