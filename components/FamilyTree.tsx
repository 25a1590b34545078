import { StyleSheet, View } from 'react-native';
import { familyTreeOrder, type Family } from '../hooks/forks';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { FamilyNodeRow, familyIndent } from './FamilyNodeRow';
import { formatDay } from './SetupSheetFormat';

export type FamilyTreeProps = {
  family: Family;
  /** The setup the family is seen from. */
  self: { id: number; title: string; ownerHandle: string; createdAt: string };
  /** Where "Start from this setup" goes, for the empty state; null when the viewer cannot fork. */
  forkHref: string | null;
};

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function SelfRow({ self, indent }: { self: FamilyTreeProps['self']; indent: number }) {
  const { colors, isWide } = useTheme();
  return (
    <View
      role="listitem"
      aria-current="page"
      style={[styles.self, { marginLeft: familyIndent(indent, isWide).margin, backgroundColor: colors.accentSoft, borderColor: colors.accent }]}
    >
      <AppText style={styles.bold}>{self.title}</AppText>
      <AppText variant="caption" tone="muted">
        This setup · @{self.ownerHandle} · {formatDay(self.createdAt)}
      </AppText>
    </View>
  );
}

/** Counts, the chain of originals up to the root, and the tree of forks below this setup. */
export function FamilyTree({ family, self, forkHref }: FamilyTreeProps) {
  const forks = familyTreeOrder(self.id, family.descendants);
  const below = forks.length;
  return (
    <>
      <Card role="region" aria-label="Family counts">
        <AppText variant="heading">
          {plural(family.forkCount, 'fork', 'forks')} of this setup · {plural(family.familyForkCount, 'fork', 'forks')} in the whole family
        </AppText>
        <AppText tone="muted">
          {family.ancestors.length > 0
            ? `It is itself a fork, ${plural(family.ancestors.length, 'step', 'steps')} from the first setup of the family.`
            : 'It is the first setup of its family.'}
        </AppText>
      </Card>
      {family.ancestors.length > 0 ? (
        <Card role="region" aria-label="Where it came from">
          <AppText variant="heading">Where it came from</AppText>
          <AppText tone="muted">The first setup of the family at the top; this one was forked from the last.</AppText>
          <View role="list" aria-label="Originals, the first one at the top">
            {family.ancestors.map((node, i) => (
              <FamilyNodeRow key={node.id} node={node} indent={i} />
            ))}
          </View>
        </Card>
      ) : null}
      <Card role="region" aria-label="Forks of this setup">
        <AppText variant="heading">Forks below this setup{below > 0 ? ` (${below})` : ''}</AppText>
        <View role="list" aria-label="This setup and its forks, each under the setup it came from">
          <SelfRow self={self} indent={0} />
          {forks.map((node) => (
            <FamilyNodeRow key={node.id} node={node} indent={Math.max(1, node.depth)} />
          ))}
        </View>
        {below === 0 ? (
          <>
            <AppText tone="muted">No forks yet. When racers start from this setup, their copies appear here.</AppText>
            {forkHref ? <ButtonLink href={forkHref} label="Start from this setup" /> : null}
          </>
        ) : null}
      </Card>
    </>
  );
}

const styles = StyleSheet.create({
  self: { minHeight: layout.minTouchTarget, borderWidth: 1, borderRadius: radius.sm, padding: space.sm, gap: 2 },
  bold: { fontWeight: '700' },
});
