import { route } from '../../http/route';
import { PHYSICS_VERSION_LABEL } from '../../version';

export const healthRoutes = [
  route({
    method: 'get',
    path: '/api/health',
    access: 'public',
    summary: 'Server and database status',
    async handler({ deps, res }) {
      const started = performance.now();
      let database: 'up' | 'down' = 'up';
      try {
        await deps.sequelize.query('SELECT 1', { plain: true });
      } catch {
        database = 'down';
      }
      const body = {
        status: database === 'up' ? 'ok' : 'degraded',
        server: 'up',
        database,
        databaseMs: Math.round((performance.now() - started) * 10) / 10,
        version: PHYSICS_VERSION_LABEL,
        time: new Date().toISOString(),
      };
      res.setHeader('Cache-Control', 'no-store');
      return { status: database === 'up' ? 200 : 503, body };
    },
  }),
];
