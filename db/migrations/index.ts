import type { QueryInterface } from 'sequelize';
import * as coreTables from './20261201-0001-core-tables';
import * as routesStepsLinks from './20261201-0002-routes-steps-links';
import * as revisionsWorkflow from './20261202-0003-revisions-workflow';
import * as commentsFlagsNotifications from './20261202-0004-comments-flags-notifications';
import * as decisions from './20261202-0005-decisions';
import * as fits from './20261202-0007-fits';
import * as teamSpecies from './20261202-0006-team-species';
import * as passwordResetSessions from './20261203-0008-password-reset-sessions';
import * as rateLimitWindows from './20261204-0009-rate-limit-windows';
import * as revokedSessions from './20261205-0010-revoked-sessions';
import * as teamSpeciesStructure from './20261206-0011-team-species-structure';
import * as cautionCollapsed from './20261206-0012-caution-collapsed';

export interface MigrationModule {
  up(params: { context: QueryInterface }): Promise<void>;
  down(params: { context: QueryInterface }): Promise<void>;
}

// Listed explicitly (not globbed) so the same list runs under tsx, vitest and the app bundle. Append only.
export const MIGRATIONS: ReadonlyArray<{ name: string; module: MigrationModule }> = [
  { name: '20261201-0001-core-tables', module: coreTables },
  { name: '20261201-0002-routes-steps-links', module: routesStepsLinks },
  { name: '20261202-0003-revisions-workflow', module: revisionsWorkflow },
  { name: '20261202-0004-comments-flags-notifications', module: commentsFlagsNotifications },
  { name: '20261202-0005-decisions', module: decisions },
  { name: '20261202-0006-team-species', module: teamSpecies },
  { name: '20261203-0008-password-reset-sessions', module: passwordResetSessions },
  { name: '20261202-0007-fits', module: fits },
  { name: '20261204-0009-rate-limit-windows', module: rateLimitWindows },
  { name: '20261205-0010-revoked-sessions', module: revokedSessions },
  { name: '20261206-0011-team-species-structure', module: teamSpeciesStructure },
  { name: '20261206-0012-caution-collapsed', module: cautionCollapsed },
];
