import { useContext, type ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { SafeAreaInsetsContext } from 'react-native-safe-area-context';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { TextLink } from './TextLink';

export type SetupPageFrameProps = {
  title: string;
  back: { href: string; label: string };
  children: ReactNode;
};

// A sheet beside its summary needs more room than the usual reading column.
const WIDE_MAX_WIDTH = layout.contentMaxWidth * 1.5;

/**
 * Like Screen, with a wider column so a setup page can put the sheet and its summary side by side
 * on wide windows; on phones it is the same single column.
 */
export function SetupPageFrame({ title, back, children }: SetupPageFrameProps) {
  const { colors, isWide } = useTheme();
  const insets = useContext(SafeAreaInsetsContext);
  return (
    <ScrollView
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={[styles.scroll, insets ? { paddingTop: insets.top + space.xl } : null]}
      keyboardShouldPersistTaps="handled"
    >
      <View style={[styles.column, { maxWidth: isWide ? WIDE_MAX_WIDTH : layout.contentMaxWidth }]} role="main">
        <TextLink href={back.href} label={back.label} dismissTo />
        <AppText variant="title" aria-level={1}>
          {title}
        </AppText>
        <View style={styles.body}>{children}</View>
      </View>
    </ScrollView>
  );
}

export type SetupColumnsProps = { left: ReactNode; right: ReactNode };

/** Sheet on the left, summary and the rest on the right; stacked in that order on phones. */
export function SetupColumns({ left, right }: SetupColumnsProps) {
  const { isWide } = useTheme();
  return (
    <View style={isWide ? styles.columns : styles.stack}>
      <View style={isWide ? styles.left : styles.stack}>{left}</View>
      <View style={isWide ? styles.right : styles.stack}>{right}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, alignItems: 'center', paddingHorizontal: space.lg, paddingVertical: space.xl },
  column: { width: '100%' },
  body: { marginTop: space.lg, gap: space.lg },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  left: { flex: 3, minWidth: 0, gap: space.lg },
  right: { flex: 2, minWidth: 0, gap: space.lg },
  stack: { gap: space.lg },
});
