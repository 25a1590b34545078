import { StyleSheet, View } from 'react-native';
import type { DiscoverSort } from '../shared/types/community';
import { TRACK_TYPES, type TrackTypeKey } from '../shared/types/trackTypes';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';

const SORT_OPTIONS: readonly ChoiceOption<DiscoverSort>[] = [
  { value: 'newest', label: 'Newest' },
  { value: 'most-forked', label: 'Most forked' },
  { value: 'best-for', label: 'Best for a track surface' },
];
const SURFACE_OPTIONS: readonly ChoiceOption<TrackTypeKey>[] = TRACK_TYPES.map((t) => ({ value: t.key, label: t.label, spoken: `Best for ${t.label}` }));

export type DiscoverSortPickerProps = {
  sort: DiscoverSort;
  bestFor: TrackTypeKey;
  onSort: (sort: DiscoverSort) => void;
  onBestFor: (trackType: TrackTypeKey) => void;
  /** Why the list is in this order, as the server explains it; null until the first page arrives. */
  explanation: string | null;
};

/** The order of the list, the surface "best for" ranks by, and why the list is in that order. */
export function DiscoverSortPicker({ sort, bestFor, onSort, onBestFor, explanation }: DiscoverSortPickerProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.group}>
      <ChoiceChips label="Order" options={SORT_OPTIONS} selected={[sort]} onChange={([value]) => onSort(value)} />
      {sort === 'best-for' ? (
        <ChoiceChips label="Best for which surface?" options={SURFACE_OPTIONS} selected={[bestFor]} onChange={([value]) => onBestFor(value)} />
      ) : null}
      {explanation ? (
        <View style={[styles.why, { borderColor: colors.accent, backgroundColor: colors.accentSoft }]} aria-label="Why this order" role="note">
          <AppText variant="caption" style={styles.whyTitle}>
            Why this order
          </AppText>
          <AppText variant="caption">{explanation}</AppText>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
  why: { borderLeftWidth: 3, paddingVertical: space.sm, paddingHorizontal: space.md, gap: space.xs },
  whyTitle: { fontWeight: '700' },
});
