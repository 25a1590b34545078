import { useContext, type ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { SafeAreaInsetsContext } from 'react-native-safe-area-context';
import { layout, space, useTheme } from '../theme';

export type SetupDetailsFormFrameProps = { children: ReactNode };

/**
 * Screen's scrolling column without its plain back link: the details form draws its own way back,
 * one that asks before unsaved words are lost.
 */
export function SetupDetailsFormFrame({ children }: SetupDetailsFormFrameProps) {
  const { colors } = useTheme();
  const insets = useContext(SafeAreaInsetsContext);
  return (
    <ScrollView
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={[styles.scroll, insets ? { paddingTop: insets.top + space.xl } : null]}
      keyboardShouldPersistTaps="handled"
    >
      <View style={styles.column} role="main">
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, alignItems: 'center', paddingHorizontal: space.lg, paddingVertical: space.xl },
  column: { width: '100%', maxWidth: layout.contentMaxWidth },
});
