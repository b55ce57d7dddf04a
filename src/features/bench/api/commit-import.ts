import { useMutation, useQueryClient } from '@tanstack/react-query';
import { postImport } from './import-request';
import { observationsChanged } from './observations-changed';

/**
 * Imports every row or none. The key is made once per chosen file, so a double click or a
 * retry after a dropped connection gets the first import's answer back instead of a second copy.
 */
export const commitImport = ({ file, idempotencyKey }: { file: File; idempotencyKey: string }) => postImport(file, { dryRun: false, idempotencyKey });

export function useCommitImport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: commitImport,
    // An import can name recipes of any programme, so every programme's overlay is asked again.
    onSuccess: () => observationsChanged(queryClient),
  });
}

/** 128 random bits as hex; getRandomValues works on plain-http installations, where randomUUID does not exist. */
export function newIdempotencyKey(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return `import-${Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('')}`;
}
