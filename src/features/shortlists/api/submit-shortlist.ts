import { useMoveShortlist } from './move-shortlist';

/** Draft → submitted; the server e-mails every active manager. */
export const useSubmitShortlist = (id: number) => useMoveShortlist<void>(id, 'submit');
