import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import type { KitSummary, TrackSummary } from '../shared/types/catalog';
import { space } from '../theme';
import { AppText } from './AppText';
import { DiscoverToggle } from './DiscoverToggle';
import { KitList } from './KitList';
import { EmptyState, ErrorState, LoadingState } from './StatusViews';
import { TrackList } from './TrackList';

/** A list that loads: its data, or why it is not there yet. */
type Loadable<T> = { data: T[] | undefined; isPending: boolean; error: Error | null; refetch: () => void };

export type DiscoverCatalogProps = {
  kits: Loadable<KitSummary>;
  tracks: Loadable<TrackSummary>;
  /** Open at first; the newcomer's way in (Discover → a kit → its setups) starts here. */
  initiallyOpen?: boolean;
};

function Section<T>({ title, noun, list, render }: { title: string; noun: string; list: Loadable<T>; render: (items: T[]) => ReactElement }) {
  let body: ReactElement;
  if (list.isPending) body = <LoadingState label={`Loading ${noun}…`} />;
  else if (list.error || !list.data) body = <ErrorState title={`${title} could not load`} message={list.error?.message ?? ''} onRetry={list.refetch} />;
  else if (list.data.length === 0) body = <EmptyState title={`No ${noun} yet`} message={`${title} appear here once they are added.`} />;
  else body = render(list.data);
  return (
    <View style={styles.section}>
      <AppText variant="heading">{title}</AppText>
      {body}
    </View>
  );
}

/** The kits and tracks below the setups, with a toggle to fold them away: a kit's page lists its public setups. */
export function DiscoverCatalog({ kits, tracks, initiallyOpen = true }: DiscoverCatalogProps) {
  const [open, setOpen] = useState(initiallyOpen);
  return (
    <View style={styles.group}>
      <DiscoverToggle label="Kits and tracks" open={open} onToggle={() => setOpen(!open)} />
      {open ? (
        <>
          <Section title="Kits" noun="kits" list={kits} render={(items) => <KitList kits={items} />} />
          <Section title="Tracks" noun="tracks" list={tracks} render={(items) => <TrackList tracks={items} />} />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.lg },
  section: { gap: space.sm },
});
