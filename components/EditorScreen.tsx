import { useCallback, useContext, useRef, useState, type ReactNode, type RefObject } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { SafeAreaInsetsContext } from 'react-native-safe-area-context';
import { layout, space, useTheme } from '../theme';

export type EditorScreenProps = {
  scrollRef: RefObject<ScrollView | null>;
  /** The scrolled column; anchors are measured against it. */
  columnRef: RefObject<View | null>;
  /** The section list beside the sheet on wide screens; phones get chips inside `children` instead. */
  sideIndex?: ReactNode;
  /** The sheet; anchors registered with `useEditorNavigation` can sit anywhere inside it. */
  children: ReactNode;
  /** Stays on screen while the sheet scrolls, so the count of changes and Save are always in reach. */
  saveBar: ReactNode;
};

/** The editor's frame: a scrolling sheet, an optional side index and a save bar pinned to the bottom. */
export function EditorScreen({ scrollRef, columnRef, sideIndex, children, saveBar }: EditorScreenProps) {
  const { colors, isWide } = useTheme();
  const insets = useContext(SafeAreaInsetsContext);
  return (
    <View style={[styles.root, { backgroundColor: colors.background }]}>
      {isWide && sideIndex ? (
        <ScrollView style={[styles.side, { borderColor: colors.border, backgroundColor: colors.surface }]} contentContainerStyle={styles.sideContent}>
          {sideIndex}
        </ScrollView>
      ) : null}
      <View style={styles.pane}>
        <ScrollView ref={scrollRef} style={styles.scroll} keyboardShouldPersistTaps="handled">
          <View ref={columnRef} role="main" style={[styles.column, { paddingTop: (insets?.top ?? 0) + space.xl }]}>
            {children}
          </View>
        </ScrollView>
        <View role="region" aria-label="Save changes" style={[styles.bar, { backgroundColor: colors.surface, borderColor: colors.border, paddingBottom: (insets?.bottom ?? 0) + space.sm }]}>
          <View style={styles.barColumn}>{saveBar}</View>
        </View>
      </View>
    </View>
  );
}

/**
 * Which sections are open, and jumps to a section or any other anchor (the note, the conflict
 * panel). Positions are measured at the moment of the jump: on the web a layout event only fires
 * when an element changes size, so positions remembered earlier go stale as sections above open.
 */
export function useEditorNavigation(initiallyOpen: readonly string[]) {
  const scrollRef = useRef<ScrollView | null>(null);
  const columnRef = useRef<View | null>(null);
  const nodes = useRef(new Map<string, View>());
  const refs = useRef(new Map<string, (node: View | null) => void>());
  const [open, setOpen] = useState<ReadonlySet<string>>(() => new Set(initiallyOpen));
  const anchor = useCallback((key: string) => {
    let ref = refs.current.get(key);
    if (!ref) {
      ref = (node: View | null) => {
        if (node) nodes.current.set(key, node);
        else nodes.current.delete(key);
      };
      refs.current.set(key, ref);
    }
    return ref;
  }, []);
  const toggle = useCallback((key: string) => {
    setOpen((prev) => {
      const next = new Set(prev);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });
  }, []);
  const jumpTo = useCallback((key: string) => {
    setOpen((prev) => (prev.has(key) ? prev : new Set([...prev, key])));
    const node = nodes.current.get(key);
    const column = columnRef.current;
    if (!node || !column || typeof node.measureLayout !== 'function') return;
    node.measureLayout(column, (_x, y) => scrollRef.current?.scrollTo({ y: Math.max(0, y - space.md), animated: true }), () => {});
  }, []);
  const openAll = useCallback((keys: readonly string[]) => setOpen((prev) => new Set([...prev, ...keys])), []);
  return { scrollRef, columnRef, open, toggle, jumpTo, openAll, anchor };
}

const styles = StyleSheet.create({
  root: { flex: 1, flexDirection: 'row' },
  pane: { flex: 1 },
  side: { width: layout.railWidth, flexGrow: 0, borderRightWidth: 1 },
  sideContent: { paddingVertical: space.xl, paddingHorizontal: space.sm },
  scroll: { flex: 1 },
  column: {
    width: '100%',
    maxWidth: layout.contentMaxWidth,
    alignSelf: 'center',
    paddingHorizontal: space.lg,
    paddingBottom: space.xxl,
    gap: space.lg,
  },
  bar: { borderTopWidth: 1, paddingTop: space.sm },
  // Same width and padding as the sheet's column, so the bar lines up with the fields above it.
  barColumn: { width: '100%', maxWidth: layout.contentMaxWidth, alignSelf: 'center', paddingHorizontal: space.lg },
});
