import { StyleSheet, View } from 'react-native';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';

export type GithubButtonProps = { onPress: () => void; disabled?: boolean };

/** The other way in: an "or" rule, then the button that leaves for GitHub's consent page. */
export function GithubButton({ onPress, disabled }: GithubButtonProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.block}>
      <View style={styles.rule} aria-hidden>
        <View style={[styles.line, { backgroundColor: colors.border }]} />
        <AppText variant="caption" tone="muted">
          or
        </AppText>
        <View style={[styles.line, { backgroundColor: colors.border }]} />
      </View>
      <Button label="Continue with GitHub" variant="secondary" onPress={onPress} disabled={disabled} />
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md },
  rule: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  line: { flex: 1, height: 1 },
});
