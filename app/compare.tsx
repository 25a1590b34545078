import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { Button } from '../components/Button';
import { CompareSideHeader, type CompareSide } from '../components/CompareSideHeader';
import { CompareView } from '../components/CompareView';
import { SetupPageFrame } from '../components/SetupPageFrame';
import { EmptyState, ErrorState, LoadingState } from '../components/StatusViews';
import { StatusNote } from '../components/StatusNote';
import { copyText, useDisplayUnits } from '../hooks/garageUi';
import { compareHref, useCompareSide, type CompareSideState } from '../hooks/history';
import { compareSheets } from '../shared/compute/setup';
import type { RevisionDetail } from '../shared/types/forks';
import { space, useTheme } from '../theme';

type Params = { a?: string; ar?: string; as?: string; b?: string; br?: string; bs?: string };

function positive(text: string | undefined): number | null {
  const n = Number(text);
  return text && Number.isSafeInteger(n) && n > 0 ? n : null;
}

function token(text: string | undefined): string | undefined {
  return typeof text === 'string' && text ? text : undefined;
}

function setupHref(setupId: number, share?: string): string {
  return `/setups/${setupId}${share ? `?share=${encodeURIComponent(share)}` : ''}`;
}

function sideOf(detail: RevisionDetail, share?: string): CompareSide {
  return {
    setupId: detail.setup.id,
    title: detail.setup.title,
    ownerHandle: detail.setup.ownerHandle,
    kitName: detail.setup.kitName,
    revisionNumber: detail.revision.number,
    createdAt: detail.revision.createdAt,
    changeNote: detail.revision.changeNote,
    href: setupHref(detail.setup.id, share),
  };
}

/** The loading, missing and error states of one side, or null once it is ready. */
function SideProblem({ state, position }: { state: CompareSideState; position: string }) {
  if (state.status === 'loading') return <LoadingState label={`Loading the “${position}” sheet…`} />;
  if (state.status === 'missing') {
    return <ErrorState title={`“${position}” cannot be shown`} message="This setup is not shared with you or no longer exists. Ask whoever sent the link for a fresh one." />;
  }
  if (state.status === 'no-revision') {
    return <ErrorState title={`“${position}” cannot be shown`} message={`This setup has no revision ${state.number}. Pick another revision, or open the setup’s history.`} />;
  }
  if (state.status === 'error') return <ErrorState title={`“${position}” could not load`} message={state.message} onRetry={state.retry} />;
  return null;
}

function CopyLink({ href }: { href: string }) {
  const [copied, setCopied] = useState<boolean | null>(null);
  if (Platform.OS !== 'web') return null;
  const url = `${typeof window === 'undefined' ? '' : window.location.origin}${href}`;
  return (
    <View style={styles.stack}>
      <Button label="Copy link" variant="secondary" accessibilityLabel="Copy the link to this comparison" onPress={() => void copyText(url).then(setCopied)} />
      <StatusNote message={copied === null ? null : copied ? 'Link copied.' : 'This browser would not copy it; copy the address from the address bar.'} tone={copied ? 'success' : 'caution'} />
    </View>
  );
}

export default function CompareScreen() {
  const params = useLocalSearchParams<Params>();
  const { isWide } = useTheme();
  const units = useDisplayUnits();
  const a = { setupId: positive(params.a) ?? 0, revision: positive(params.ar), share: token(params.as) };
  const b = { setupId: positive(params.b) ?? 0, revision: positive(params.br), share: token(params.bs) };
  const sideA = useCompareSide(a.setupId, a.revision, a.share);
  const sideB = useCompareSide(b.setupId, b.revision, b.share);
  const sameSetup = a.setupId === b.setupId;
  const title = sameSetup ? 'Compare revisions' : 'Compare setups';
  const back = a.setupId > 0 ? { href: setupHref(a.setupId, a.share), label: 'Back to the setup' } : { href: '/', label: 'Back to Discover' };
  if (a.setupId === 0 || b.setupId === 0) {
    return (
      <SetupPageFrame title={title} back={back}>
        <EmptyState
          title="Pick two setups to compare"
          message="Open a setup’s history and choose “Compare with…”, or open a comparison link someone shared."
          actionLabel="Find setups on Discover"
          onAction={() => router.replace('/')}
        />
      </SetupPageFrame>
    );
  }
  if (sideA.status !== 'ready' || sideB.status !== 'ready') {
    return (
      <SetupPageFrame title={title} back={back}>
        <SideProblem state={sideA} position="Before" />
        <SideProblem state={sideB} position="After" />
      </SetupPageFrame>
    );
  }
  const [left, right] = [sideOf(sideA.detail, a.share), sideOf(sideB.detail, b.share)];
  const columns = sameSetup
    ? { a: `Revision ${left.revisionNumber}`, b: `Revision ${right.revisionNumber}` }
    : { a: `${left.title} (rev ${left.revisionNumber})`, b: `${right.title} (rev ${right.revisionNumber})` };
  const comparison = compareSheets(
    { vehicleClass: sideA.detail.setup.vehicleClass, values: sideA.detail.revision.values },
    { vehicleClass: sideB.detail.setup.vehicleClass, values: sideB.detail.revision.values },
  );
  const href = compareHref(
    { setupId: a.setupId, revision: left.revisionNumber, share: a.share },
    { setupId: b.setupId, revision: right.revisionNumber, share: b.share },
  );
  const swap = () => router.setParams({ a: String(b.setupId), ar: String(right.revisionNumber), as: b.share, b: String(a.setupId), br: String(left.revisionNumber), bs: a.share });
  return (
    <SetupPageFrame title={title} back={back}>
      <View style={isWide ? styles.sides : styles.stack}>
        <View style={isWide ? styles.side : null}>
          <CompareSideHeader position="Before" side={left} revisionNumbers={sideA.revisionNumbers ?? undefined} onPickRevision={(n) => router.setParams({ ar: String(n) })} />
        </View>
        <View style={isWide ? styles.side : null}>
          <CompareSideHeader position="After" side={right} revisionNumbers={sideB.revisionNumbers ?? undefined} onPickRevision={(n) => router.setParams({ br: String(n) })} />
        </View>
      </View>
      <View style={styles.actions}>
        <Button label="Swap sides" variant="secondary" accessibilityLabel="Swap before and after" onPress={swap} />
        <CopyLink href={href} />
      </View>
      <CompareView comparison={comparison} classes={{ a: sideA.detail.setup.vehicleClass, b: sideB.detail.setup.vehicleClass }} columns={columns} units={units} wide={isWide} />
    </SetupPageFrame>
  );
}

const styles = StyleSheet.create({
  sides: { flexDirection: 'row', alignItems: 'stretch', gap: space.lg },
  side: { flex: 1, minWidth: 0 },
  stack: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.md },
});
