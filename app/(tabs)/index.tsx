import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { AppText } from '../../components/AppText';
import { DiscoverCatalog } from '../../components/DiscoverCatalog';
import { DiscoverFilters, EMPTY_DISCOVER_DRAFT, activeFilterCount, filtersFromDraft, type DiscoverDraft } from '../../components/DiscoverFilters';
import { DiscoverList } from '../../components/DiscoverList';
import { DiscoverSortPicker } from '../../components/DiscoverSortPicker';
import { DiscoverToggle } from '../../components/DiscoverToggle';
import { HealthBadge } from '../../components/HealthBadge';
import { SearchBox } from '../../components/SearchBox';
import { SearchKitSuggestions } from '../../components/SearchKitSuggestions';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { useKitsQuery, useTracksQuery } from '../../hooks/catalog';
import { useDiscoverQuery, useSearchQuery } from '../../hooks/discover';
import { useDisplayUnits } from '../../hooks/garageUi';
import { useHealthQuery } from '../../hooks/health';
import { useDebouncedValue } from '../../hooks/useDebouncedValue';
import type { KitSuggestion } from '../../shared/types/community';
import { space, useTheme } from '../../theme';

/** One request per pause in typing. */
const TYPING_PAUSE_MS = 300;

function ServerStatus() {
  const health = useHealthQuery();
  if (health.isPending) return <HealthBadge state="checking" />;
  if (health.isError) return <HealthBadge state="down" detail={health.error.message} />;
  return <HealthBadge state="ok" />;
}

function filterButtonLabel(count: number): string {
  return count === 0 ? 'Filters' : `Filters (${count} on)`;
}

export default function DiscoverScreen() {
  const { isWide } = useTheme();
  const units = useDisplayUnits();
  const kits = useKitsQuery();
  const tracks = useTracksQuery();
  const [draft, setDraft] = useState<DiscoverDraft>(EMPTY_DISCOVER_DRAFT);
  const [text, setText] = useState('');
  const [filtersOpen, setFiltersOpen] = useState(isWide);

  const words = useDebouncedValue(text.trim(), TYPING_PAUSE_MS);
  const tempMin = useDebouncedValue(draft.tempMin, TYPING_PAUSE_MS);
  const tempMax = useDebouncedValue(draft.tempMax, TYPING_PAUSE_MS);
  const { filters } = filtersFromDraft({ ...draft, tempMin, tempMax }, units);
  const { errors } = filtersFromDraft(draft, units);
  const searching = words.length > 0;
  const discover = useDiscoverQuery(filters, !searching);
  const search = useSearchQuery(words);
  const results = searching ? search : discover;
  const setups = results.data?.pages.flatMap((page) => page.setups) ?? [];

  const change = <K extends keyof DiscoverDraft>(field: K, value: DiscoverDraft[K]) =>
    setDraft((prev) => {
      const next = { ...prev, [field]: value };
      // A kit of another class cannot be among the class's setups.
      if (field === 'vehicleClass' && value !== 'any' && kits.data?.find((k) => String(k.id) === prev.kitId)?.vehicleClass !== value) next.kitId = 'any';
      // "Best for" starts from the surface already filtered on: that is the track the racer has in mind.
      if (field === 'sort' && value === 'best-for' && prev.trackType !== 'any') next.bestFor = prev.trackType as DiscoverDraft['bestFor'];
      return next;
    });
  const pickKit = (kit: KitSuggestion) => {
    setDraft((prev) => ({ ...prev, vehicleClass: 'any', kitId: String(kit.id) }));
    setText('');
    setFiltersOpen(true);
  };
  const clearFilters = () => setDraft((prev) => ({ ...EMPTY_DISCOVER_DRAFT, sort: prev.sort, bestFor: prev.bestFor }));
  const filterCount = activeFilterCount(draft);

  const header = (
    <>
      <View style={styles.title}>
        <AppText variant="title" aria-level={1}>
          Discover
        </AppText>
        <AppText tone="muted">Proven setups for your kit and tonight&apos;s track.</AppText>
      </View>
      <ServerStatus />
      <SearchBox value={text} onChange={setText} />
      {searching ? (
        <>
          <SearchKitSuggestions kits={search.data?.pages[0]?.kitSuggestions ?? []} onPick={pickKit} />
          <AppText variant="caption" tone="muted">
            Best matches first. Filters and order apply when the search is empty.
          </AppText>
        </>
      ) : (
        <>
          <DiscoverToggle label={filterButtonLabel(filterCount)} open={filtersOpen} onToggle={() => setFiltersOpen(!filtersOpen)} />
          {filtersOpen ? <DiscoverFilters draft={draft} onChange={change} kits={kits.data ?? []} units={units} errors={errors} /> : null}
          <DiscoverSortPicker
            sort={draft.sort}
            bestFor={draft.bestFor}
            onSort={(sort) => change('sort', sort)}
            onBestFor={(trackType) => change('bestFor', trackType)}
            explanation={discover.data?.pages[0]?.explanation ?? null}
          />
        </>
      )}
    </>
  );

  let empty;
  if (results.isPending) empty = <LoadingState label={searching ? 'Searching…' : 'Finding setups…'} />;
  else if (results.isError) empty = <ErrorState title="Setups could not load" message={results.error.message} onRetry={() => void results.refetch()} />;
  else if (searching)
    empty = (
      <EmptyState
        title={`Nothing matches “${words}”`}
        message={`Try fewer or other words, or check the spelling${search.data?.pages[0]?.kitSuggestions.length ? ', or pick a kit above' : ''}.`}
        actionLabel="Clear the search"
        onAction={() => setText('')}
      />
    );
  else if (filterCount > 0)
    empty = <EmptyState title="No setups match these filters" message="Widen the temperature range, or pick another kit or surface." actionLabel="Clear filters" onAction={clearFilters} />;
  else empty = <EmptyState title="No public setups yet" message="Setups racers make public appear here. Publish one of yours from your garage." />;

  return (
    <View role="main" style={styles.main}>
      <DiscoverList
        setups={setups}
        units={units}
        header={header}
        empty={empty}
        footer={<DiscoverCatalog kits={{ ...kits, refetch: () => void kits.refetch() }} tracks={{ ...tracks, refetch: () => void tracks.refetch() }} />}
        hasMore={results.hasNextPage}
        loadingMore={results.isFetchingNextPage}
        moreError={results.isFetchNextPageError ? results.error.message : null}
        onMore={() => void results.fetchNextPage()}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  main: { flex: 1 },
  title: { gap: space.xs },
});
