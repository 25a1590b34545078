import { useContext, type ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { SafeAreaInsetsContext } from 'react-native-safe-area-context';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { TextLink } from './TextLink';

export type ScreenProps = {
  title: string;
  /** One line under the title saying what this screen is for. */
  subtitle?: string;
  /** Screens outside the tab bar offer a way back to where they belong. */
  back?: { href: string; label: string };
  children: ReactNode;
};

/** A scrolling screen with a title; on wide windows the content sits in a centred column. */
export function Screen({ title, subtitle, back, children }: ScreenProps) {
  const { colors } = useTheme();
  // Tab screens sit under the tab layout's top bar; screens with a back link own the top edge.
  const insets = useContext(SafeAreaInsetsContext);
  return (
    <ScrollView
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={[styles.scroll, back && insets ? { paddingTop: insets.top + space.xl } : null]}
      keyboardShouldPersistTaps="handled"
    >
      <View style={styles.column} role="main">
        {back ? <TextLink href={back.href} label={back.label} dismissTo /> : null}
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
