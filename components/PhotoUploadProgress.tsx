import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type PhotoUploadProgressProps = {
  /** Share of the file sent so far, from 0 to 1. */
  fraction: number;
};

/** How much of the photo has gone up, as a bar and in words. */
export function PhotoUploadProgress({ fraction }: PhotoUploadProgressProps) {
  const { colors } = useTheme();
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  // The last moments are the server checking and resizing the photo, not the upload.
  const words = percent >= 100 ? 'Sent; Tunefork is checking and resizing it…' : `Uploading the photo… ${percent}%`;
  return (
    <View style={styles.group}>
      <View
        role="progressbar"
        // Lets native screen readers (and role queries) treat the bar as one element with a value.
        accessible
        aria-label="Photo upload"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${percent}%`}
        style={[styles.track, { backgroundColor: colors.accentSoft, borderColor: colors.accent }]}
      >
        <View style={[styles.fill, { width: `${percent}%`, backgroundColor: colors.accent }]} />
      </View>
      <AppText variant="caption" tone="muted" aria-live="polite">
        {words}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  track: { height: space.md, borderRadius: radius.pill, borderWidth: 1, overflow: 'hidden' },
  fill: { height: '100%' },
});
