import { useMoveShortlist } from './move-shortlist';

/** Submitted → approved (never by its author); the shortlist is frozen and its author e-mailed. */
export const useApproveShortlist = (id: number) => useMoveShortlist<{ comment?: string }>(id, 'approve');
