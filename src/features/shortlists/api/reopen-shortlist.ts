import { useMoveShortlist } from './move-shortlist';

/** Returned → draft, so the author can change it and submit again. */
export const useReopenShortlist = (id: number) => useMoveShortlist<void>(id, 'reopen');
