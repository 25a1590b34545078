import { StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';

export type BrandMarkProps = { compact?: boolean };

/** The Tunefork word mark: a two-tined fork that splits from one stem, as setups do. */
export function BrandMark({ compact }: BrandMarkProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.row} aria-label="Tunefork" role="img">
      <Svg width={28} height={28} viewBox="0 0 28 28" aria-hidden>
        <Path
          d="M14 26 V15 M14 15 C14 11 8 11 8 6 V2 M14 15 C14 11 20 11 20 6 V2"
          stroke={colors.accent}
          strokeWidth={3}
          strokeLinecap="round"
          fill="none"
        />
      </Svg>
      {compact ? null : (
        <AppText variant="heading" aria-hidden>
          Tunefork
        </AppText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
