import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import type { FamilyNode } from '../hooks/forks';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { formatDay } from './SetupSheetFormat';

export type FamilyNodeRowProps = {
  node: FamilyNode;
  /** Steps in from the left edge: the node's generation within what the list shows. */
  indent: number;
};

// Phones keep the tree readable by indenting less and stopping after a few steps; the caption still
// says how deep a fork sits, so nothing is lost when the indentation stops growing.
const INDENT = { phone: { step: space.md, max: 5 }, wide: { step: space.xl, max: 12 } } as const;

/** Left margin for a row `indent` generations in, and whether the margin stopped growing before it. */
export function familyIndent(indent: number, isWide: boolean): { margin: number; capped: boolean } {
  const { step, max } = isWide ? INDENT.wide : INDENT.phone;
  return { margin: Math.min(indent, max) * step, capped: indent > max };
}

export function changedText(count: number | null): string {
  if (count === null) return 'The first of the family';
  if (count === 0) return 'Same values as its parent';
  return `${count} field${count === 1 ? '' : 's'} changed from its parent`;
}

function NodeText({ node, level }: { node: FamilyNode; level: string }) {
  return (
    <View style={styles.text}>
      <AppText style={styles.title} tone={node.visible ? 'accent' : 'muted'}>
        {node.visible ? node.title : 'Not shared'}
      </AppText>
      <AppText variant="caption" tone="muted">
        {[node.visible ? `@${node.ownerHandle}` : null, formatDay(node.createdAt), changedText(node.changedFromParent), level].filter(Boolean).join(' · ')}
      </AppText>
    </View>
  );
}

/**
 * One setup of a family tree, indented by generation. Setups the viewer may not open stay in the
 * tree as "Not shared", without a link, so the branches below them still hang together.
 */
export function FamilyNodeRow({ node, indent }: FamilyNodeRowProps) {
  const { colors, isWide } = useTheme();
  const { margin, capped } = familyIndent(indent, isWide);
  const level = capped ? `level ${indent}` : '';
  const frame = [styles.row, { marginLeft: margin, borderLeftColor: indent > 0 ? colors.border : 'transparent' }];
  if (!node.visible) {
    return (
      <View role="listitem" aria-label={`Not shared, ${formatDay(node.createdAt)}`} style={frame}>
        <NodeText node={node} level={level} />
      </View>
    );
  }
  return (
    <View role="listitem">
      <Link href={`/setups/${node.id}`} asChild>
        <Pressable role="link" aria-label={`${node.title} by @${node.ownerHandle}`} style={StyleSheet.flatten(frame)}>
          <NodeText node={node} level={level} />
        </Pressable>
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: layout.minTouchTarget, paddingVertical: space.sm, paddingLeft: space.sm, borderLeftWidth: 2, justifyContent: 'center' },
  text: { gap: 2 },
  title: { fontWeight: '700' },
});
