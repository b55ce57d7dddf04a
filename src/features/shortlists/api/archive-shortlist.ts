import { useMoveShortlist } from './move-shortlist';

/** Takes a shortlist that is not approved off the lists; it stays on record. */
export const useArchiveShortlist = (id: number) => useMoveShortlist<void>(id, 'archive');
