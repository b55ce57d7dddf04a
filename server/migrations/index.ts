import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-users-and-audit';
import * as m0002 from './0002-team-data';
import * as m0003 from './0003-calibrations';
import * as m0004 from './0004-plans';
import * as m0005 from './0005-programme-change-indexes';
import * as m0006 from './0006-shortlist-item-snapshots';
import * as m0007 from './0007-user-session-version';
import * as m0008 from './0008-idempotent-writes';
import * as m0009 from './0009-observations-export-order';
import * as m0010 from './0010-check-schedules';
import * as m0011 from './0011-observation-sample-height';

export interface Migration {
  name: string;
  up: (params: { context: QueryInterface }) => Promise<void>;
  down: (params: { context: QueryInterface }) => Promise<void>;
}

/** Every migration, oldest first. Add new ones at the end; never edit one that has shipped. */
export const MIGRATIONS: Migration[] = [
  { name: '0001-users-and-audit', ...m0001 },
  { name: '0002-team-data', ...m0002 },
  { name: '0003-calibrations', ...m0003 },
  { name: '0005-programme-change-indexes', ...m0005 },
  { name: '0004-plans', ...m0004 },
  { name: '0006-shortlist-item-snapshots', ...m0006 },
  { name: '0007-user-session-version', ...m0007 },
  { name: '0008-idempotent-writes', ...m0008 },
  { name: '0009-observations-export-order', ...m0009 },
  { name: '0010-check-schedules', ...m0010 },
  { name: '0011-observation-sample-height', ...m0011 },
];
