import { z } from 'zod';
import { route } from '../../http/route';
import { badRequest } from '../../errors';
import { cachedMapPoints } from '../../services/map-points';
import { decimalId } from '../../../shared/schemas/common';

/**
 * Everything the map overlays for a programme in one call, as columns + rows so that 10,000
 * points stay small; served from a per-change cache, gzipped when the client accepts it.
 */
export const mapPointRoutes = [
  route({
    method: 'get',
    path: '/api/map-points',
    access: 'data.read',
    summary: "A programme's recipes and observations in every map coordinate",
    query: z.object({ programme: decimalId('programme') }),
    async handler({ query, deps, req, res }) {
      const points = await cachedMapPoints(deps.sequelize, query.programme);
      if (!points) throw badRequest('programmeId: no such programme', 'programmeId');
      res.setHeader('Cache-Control', 'private, no-cache');
      res.setHeader('ETag', points.etag);
      res.setHeader('Vary', 'Accept-Encoding');
      if (req.headers['if-none-match'] === points.etag) {
        res.status(304).end();
        return;
      }
      res.type('application/json');
      if (/\bgzip\b/.test(String(req.headers['accept-encoding'] ?? ''))) {
        res.setHeader('Content-Encoding', 'gzip');
        res.send(points.gzip);
      } else {
        res.send(points.json);
      }
    },
  }),
];
