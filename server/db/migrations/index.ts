import type { MigrationContext } from '../migrator';
import * as demoWorld from './20261202T0000-catalog-and-racers';
import * as accounts from './20261202T0100-accounts';
import * as garage from './20261202T0200-garage-and-setups';
import * as forks from './20261202T0300-forks';
import * as upstreamSync from './20261202T0400-upstream-sync';
import * as comments from './20261202T0500-comments';
import * as trackDays from './20261202T0600-track-days';
import * as follows from './20261202T0700-follows-and-notifications';
import * as votes from './20261202T0800-votes-and-search';
import * as mailQueue from './20261202T0900-mail-preferences';
import * as moderation from './20261202T1000-moderation';
import * as forksOfOwner from './20261202T1100-forks-of-owner';
import * as feedItems from './20261202T1200-feed-items';
import * as moderationNotices from './20261202T1005-moderation-notices';
import * as revisionChangeCounts from './20261202T1300-revision-change-counts';

export type Migration = {
  name: string;
  up(ctx: MigrationContext): Promise<void>;
  down(ctx: MigrationContext): Promise<void>;
};

/** Every migration, oldest first. A new file is added here with a timestamped name. */
export const migrations: Migration[] = [
  { name: '20261202T0000-catalog-and-racers', ...demoWorld },
  { name: '20261202T0100-accounts', ...accounts },
  { name: '20261202T0200-garage-and-setups', ...garage },
  { name: '20261202T0300-forks', ...forks },
  { name: '20261202T0400-upstream-sync', ...upstreamSync },
  { name: '20261202T0500-comments', ...comments },
  { name: '20261202T0600-track-days', ...trackDays },
  { name: '20261202T0700-follows-and-notifications', ...follows },
  { name: '20261202T0800-votes-and-search', ...votes },
  { name: '20261202T0900-mail-preferences', ...mailQueue },
  { name: '20261202T1000-moderation', ...moderation },
  { name: '20261202T1005-moderation-notices', ...moderationNotices },
  { name: '20261202T1100-forks-of-owner', ...forksOfOwner },
  { name: '20261202T1200-feed-items', ...feedItems },
  { name: '20261202T1300-revision-change-counts', ...revisionChangeCounts },
];
