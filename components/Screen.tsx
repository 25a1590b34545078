import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type ScreenProps = {
  title: string;
  /** One line under the title saying what this screen is for. */
  subtitle?: string;
  children: ReactNode;
};

/** A scrolling screen with a title; on wide windows the content sits in a centred column. */
export function Screen({ title, subtitle, children }: ScreenProps) {
  const { colors } = useTheme();
  return (
    <ScrollView
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={styles.scroll}
      keyboardShouldPersistTaps="handled"
    >
      <View style={styles.column} role="main">
        <AppText variant="title" aria-level={1}>
          {title}
        </AppText>
        {subtitle ? (
          <AppText tone="muted" style={styles.subtitle}>
            {subtitle}
          </AppText>
        ) : null}
        <View style={styles.body}>{children}</View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, alignItems: 'center', paddingHorizontal: space.lg, paddingVertical: space.xl },
  column: { width: '100%', maxWidth: layout.contentMaxWidth },
  subtitle: { marginTop: space.xs },
  body: { marginTop: space.xl, gap: space.lg },
});
