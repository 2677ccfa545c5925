import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-initial';
import * as m0002 from './0002-field-work';
import * as m0003 from './0003-girder-survey';
import * as m0004 from './0004-check-client-key';
import * as m0006 from './0006-session-security';
import * as m0005 from './0005-bridge-record';
import * as m0007 from './0007-attachment-client-key';
import * as m0008 from './0008-bridge-search';
import * as m0009 from './0009-one-time-tokens';

export type Migration = {
  name: string;
  up: (params: { context: QueryInterface }) => Promise<void>;
  down: (params: { context: QueryInterface }) => Promise<void>;
};

/**
 * Every migration in order. Listed by hand (not globbed) so the bundled server and the CLI run the
 * same set. Append new ones at the end; never edit or reorder one that has shipped.
 */
export const migrations: Migration[] = [
  { name: '0001-initial', ...m0001 },
  { name: '0002-field-work', ...m0002 },
  { name: '0003-girder-survey', ...m0003 },
  { name: '0004-check-client-key', ...m0004 },
  { name: '0005-bridge-record', ...m0005 },
  { name: '0006-session-security', ...m0006 },
  { name: '0007-attachment-client-key', ...m0007 },
  { name: '0008-bridge-search', ...m0008 },
  { name: '0009-one-time-tokens', ...m0009 },
];
