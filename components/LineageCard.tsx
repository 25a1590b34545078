import { StyleSheet, View } from 'react-native';
import type { SetupDetail } from '../shared/types/setups';
import { space } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { TextLink } from './TextLink';

export type LineageCardProps = {
  setup: SetupDetail;
  /** The share code the page was opened with, carried on to the fork and family screens. */
  share?: string;
  /** Signed-in racers get the fork button, everyone else a way to sign in first; undefined while unknown. */
  signedIn: boolean | undefined;
  /** Where signing in leads, returning to the fork screen. */
  signInHref: string;
};

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function withShare(path: string, share?: string): string {
  if (!share) return path;
  return `${path}${path.includes('?') ? '&' : '?'}share=${encodeURIComponent(share)}`;
}

function ForkedFrom({ setupId, lineage, share }: { setupId: number; lineage: SetupDetail['lineage']; share?: string }) {
  const from = lineage.forkedFrom;
  if (!from) return null;
  if (!from.available) {
    return (
      <AppText>
        Forked from another setup · <AppText tone="muted">Original no longer available</AppText>
      </AppText>
    );
  }
  // Both sides as they are now; each side carries its own share code.
  const sides = [from.share ? `as=${encodeURIComponent(from.share)}` : '', share ? `bs=${encodeURIComponent(share)}` : ''].filter(Boolean).join('&');
  return (
    <View style={styles.row}>
      <TextLink href={withShare(`/setups/${from.setupId}`, from.share ?? undefined)} label={`Forked from “${from.title}” by @${from.ownerHandle} (revision ${from.revisionNumber})`} />
      <TextLink href={`/compare?a=${from.setupId}&b=${setupId}${sides ? `&${sides}` : ''}`} label="Compare with the original" />
    </View>
  );
}

/**
 * Where the setup came from and where it went: the fork action, the original it was forked from,
 * fork counts with the family view, the history and a comparison with the previous revision.
 */
export function LineageCard({ setup, share, signedIn, signInHref }: LineageCardProps) {
  const { lineage } = setup;
  const revision = setup.currentRevision.number;
  const hasFamily = lineage.forkedFrom !== null || lineage.forkCount > 0 || lineage.familyForkCount > 0;
  const forkHref = withShare(`/setups/${setup.id}/fork`, share);
  // The compare screen takes a share code per side (as, bs): both sides are this setup.
  const shareBoth = share ? `&as=${encodeURIComponent(share)}&bs=${encodeURIComponent(share)}` : '';
  const compareHref = `/compare?a=${setup.id}&ar=${revision - 1}&b=${setup.id}&br=${revision}${shareBoth}`;
  return (
    <Card role="region" aria-label="Forks and history">
      {signedIn ? (
        <View style={styles.fork}>
          <ButtonLink href={forkHref} label="Fork this setup" />
          <AppText variant="caption" tone="muted">
            Start from it on your own car, with what you have; the original stays as it is.
          </AppText>
        </View>
      ) : signedIn === false ? (
        <TextLink href={signInHref} label="Sign in to fork this setup" />
      ) : null}
      <ForkedFrom setupId={setup.id} lineage={lineage} share={share} />
      <View style={styles.row}>
        <AppText>
          {plural(lineage.forkCount, 'fork', 'forks')}
          {lineage.familyForkCount > lineage.forkCount ? ` · ${plural(lineage.familyForkCount, 'fork', 'forks')} in the whole family` : ''}
        </AppText>
        {hasFamily ? <TextLink href={withShare(`/setups/${setup.id}/family`, share)} label="See the family" /> : null}
      </View>
      <View style={styles.row}>
        <TextLink href={withShare(`/setups/${setup.id}/history`, share)} label="History of changes" />
        {revision > 1 ? <TextLink href={compareHref} label={`Compare revision ${revision} with revision ${revision - 1}`} /> : null}
      </View>
      <AppText tone="muted">{plural(setup.commentCount, 'comment', 'comments')}</AppText>
    </Card>
  );
}

const styles = StyleSheet.create({
  fork: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.lg },
});
