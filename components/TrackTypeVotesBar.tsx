import { StyleSheet, View } from 'react-native';
import Svg, { Rect } from 'react-native-svg';
import { radius, space, useTheme } from '../theme';

export type TrackTypeVotesBarProps = {
  works: number;
  fails: number;
  /** The largest vote total of any track type on this setup: every bar shares one scale. */
  scale: number;
};

/** The drawn width out of 100 for each part of the bar; empty when nobody has voted anywhere. */
export function voteBarWidths(works: number, fails: number, scale: number): { works: number; fails: number } {
  if (scale <= 0) return { works: 0, fails: 0 };
  return { works: (works / scale) * 100, fails: (fails / scale) * 100 };
}

const BAR_HEIGHT = space.md;

/**
 * One row of the votes chart: "works here" then "doesn't work here" stacked from the left, on a
 * scale shared by all track types. The counts are written beside it, so the bar is decoration for
 * screen readers.
 */
export function TrackTypeVotesBar({ works, fails, scale }: TrackTypeVotesBarProps) {
  const { colors } = useTheme();
  const widths = voteBarWidths(works, fails, scale);
  return (
    <View style={styles.frame} aria-hidden>
      <Svg width="100%" height={BAR_HEIGHT} viewBox={`0 0 100 ${BAR_HEIGHT}`} preserveAspectRatio="none">
        <Rect x={0} y={0} width={100} height={BAR_HEIGHT} fill={colors.surfaceRaised} stroke={colors.border} strokeWidth={0.5} />
        {widths.works > 0 ? <Rect testID="bar-works" x={0} y={0} width={widths.works} height={BAR_HEIGHT} fill={colors.success} /> : null}
        {widths.fails > 0 ? <Rect testID="bar-fails" x={widths.works} y={0} width={widths.fails} height={BAR_HEIGHT} fill={colors.danger} /> : null}
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { borderRadius: radius.sm, overflow: 'hidden' },
});
