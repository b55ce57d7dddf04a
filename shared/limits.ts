/** Limits used by client forms, server schemas and model checks alike. */
export const LIMITS = {
  nameLength: 120,
  emailLength: 254,
  passwordMin: 10,
  /** bcrypt reads at most 72 bytes of a password; longer ones would be silently cut. */
  passwordMaxBytes: 72,
  notesLength: 4000,
  commentLength: 2000,
  pageSizeDefault: 50,
  pageSizeMax: 200,
  jsonBodyBytes: 100 * 1024,
  invitationHours: 72,
  resetMinutes: 60,
} as const;
