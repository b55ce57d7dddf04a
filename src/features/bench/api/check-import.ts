import { useMutation } from '@tanstack/react-query';
import { postImport } from './import-request';

/** Validates a CSV without writing anything: the answer's report lists every problem by row and column. */
export const checkImport = (file: File) => postImport(file, { dryRun: true });

export const useCheckImport = () => useMutation({ mutationFn: checkImport });
