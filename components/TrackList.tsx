import { StyleSheet, View } from 'react-native';
import type { TrackSummary } from '../shared/types/catalog';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type TrackListProps = { tracks: TrackSummary[] };

/** Tracks with their surface and a line of notes. */
export function TrackList({ tracks }: TrackListProps) {
  const { colors } = useTheme();
  return (
    <Card>
      <View role="list">
        {tracks.map((track, i) => (
          <View
            key={track.id}
            role="listitem"
            style={[styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}
          >
            <AppText style={styles.name}>{track.name}</AppText>
            <AppText variant="caption" tone="accent">
              {trackTypeLabel(track.surface)} · {track.indoor ? 'indoor' : 'outdoor'}
            </AppText>
            <AppText variant="caption" tone="muted">
              {track.notes}
            </AppText>
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: space.sm, gap: 2 },
  name: { fontWeight: '700' },
});
