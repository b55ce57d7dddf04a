import { idParamSchema } from '../../../shared/schemas/common';
import { shortlistDecisionSchema, shortlistInputSchema, shortlistListQuerySchema, shortlistReturnSchema } from '../../../shared/schemas/shortlists';
import { route } from '../../http/route';
import { presentPage } from '../../presenters/page';
import { presentShortlist } from '../../presenters/shortlist';
import { archiveShortlist, createShortlist, listShortlists, loadShortlist, transitionShortlist, updateShortlist } from '../../services/shortlists';

export const shortlistRoutes = [
  route({
    method: 'get',
    path: '/api/shortlists',
    access: 'data.read',
    summary: 'Shortlists by programme and status',
    query: shortlistListQuerySchema,
    async handler({ query }) {
      const { rows, count, itemCounts } = await listShortlists(query);
      const items = rows.map((s) => ({ ...presentShortlist(s), itemCount: itemCounts.get(s.id) ?? 0 }));
      return { body: presentPage(query, items, count) };
    },
  }),
  route({
    method: 'get',
    path: '/api/shortlists/:id',
    access: 'data.read',
    summary: 'A shortlist with its recipes, reasons and history',
    params: idParamSchema,
    async handler({ params }) {
      return { body: { shortlist: presentShortlist(await loadShortlist(params.id, null)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/shortlists',
    access: 'shortlists.write',
    summary: 'Assemble a shortlist (a draft)',
    body: shortlistInputSchema,
    async handler(ctx) {
      return { status: 201, body: { shortlist: presentShortlist(await createShortlist(ctx, ctx.body)) } };
    },
  }),
  route({
    method: 'put',
    path: '/api/shortlists/:id',
    access: 'shortlists.write',
    summary: 'Replace a draft shortlist’s title, purpose, target and recipes',
    params: idParamSchema,
    body: shortlistInputSchema,
    async handler(ctx) {
      return { body: { shortlist: presentShortlist(await updateShortlist(ctx, ctx.params.id, ctx.body)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/shortlists/:id/submit',
    access: 'shortlists.write',
    summary: 'Send a draft to the managers (e-mails every manager)',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { shortlist: presentShortlist(await transitionShortlist(ctx, ctx.params.id, 'submitted', null)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/shortlists/:id/approve',
    access: 'shortlists.decide',
    summary: 'Approve a submitted shortlist (not one you wrote); it is frozen from then on',
    params: idParamSchema,
    body: shortlistDecisionSchema,
    async handler(ctx) {
      return { body: { shortlist: presentShortlist(await transitionShortlist(ctx, ctx.params.id, 'approved', ctx.body.comment ?? null)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/shortlists/:id/return',
    access: 'shortlists.decide',
    summary: 'Return a submitted shortlist to its author with a comment',
    params: idParamSchema,
    body: shortlistReturnSchema,
    async handler(ctx) {
      return { body: { shortlist: presentShortlist(await transitionShortlist(ctx, ctx.params.id, 'returned', ctx.body.comment)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/shortlists/:id/reopen',
    access: 'shortlists.write',
    summary: 'Take a returned shortlist back to draft to rework it',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { shortlist: presentShortlist(await transitionShortlist(ctx, ctx.params.id, 'draft', null)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/shortlists/:id/archive',
    access: 'shortlists.write',
    summary: 'Archive a shortlist that is not approved',
    params: idParamSchema,
    async handler(ctx) {
      return { body: { shortlist: presentShortlist(await archiveShortlist(ctx, ctx.params.id)) } };
    },
  }),
];
