import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

/** Marks a car that is as it came in the box, so others know its setups need no option parts. */
export function CarStockBadge() {
  const { colors } = useTheme();
  return (
    <View style={[styles.badge, { backgroundColor: colors.successSoft, borderColor: colors.success }]}>
      <AppText variant="caption" style={[styles.text, { color: colors.success }]}>
        Stock, no option parts
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { alignSelf: 'flex-start', borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 2 },
  text: { fontWeight: '700' },
});
