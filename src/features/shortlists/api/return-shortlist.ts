import { useMoveShortlist } from './move-shortlist';

/** Submitted → returned, with the comment the author needs to rework it. */
export const useReturnShortlist = (id: number) => useMoveShortlist<{ comment: string }>(id, 'return');
