/** The five roles of product.md; a user holds exactly one per installation. */
export const ROLES = ['admin', 'manager', 'formulator', 'scientist', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  manager: 'Programme manager',
  formulator: 'Formulator',
  scientist: 'Bench scientist',
  viewer: 'Viewer',
};

export const ROLE_SUMMARIES: Record<Role, string> = {
  admin: 'Invites people, sets roles, reads the audit trail and the outbox.',
  manager: 'Reviews submitted shortlists and approves or returns them.',
  formulator: 'Designs recipes, edits the material library, assembles shortlists.',
  scientist: 'Records bench outcomes, imports batches, attaches files.',
  viewer: 'Looks things up; changes nothing.',
};
