import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { ChoiceChips } from './ChoiceChips';
import { formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';

export type CompareSide = {
  setupId: number;
  title: string;
  ownerHandle: string;
  kitName: string;
  revisionNumber: number;
  createdAt: string;
  changeNote: string;
  /** The setup page, with its share token when it came with one. */
  href: string;
};

export type CompareSideHeaderProps = {
  /** "Before" or "After": which column this side fills. */
  position: string;
  side: CompareSide;
  /** Revision numbers of the setup, newest first, to choose from; no picker when absent. */
  revisionNumbers?: number[];
  onPickRevision?: (number: number) => void;
};

/** Which setup and revision one side of a comparison is, with a way back to it and to pick another revision. */
export function CompareSideHeader({ position, side, revisionNumbers, onPickRevision }: CompareSideHeaderProps) {
  return (
    <Card>
      <AppText variant="caption" tone="muted" style={styles.bold}>
        {position}
      </AppText>
      <AppText variant="heading" aria-level={2}>
        {side.title}
      </AppText>
      <View style={styles.meta}>
        <TextLink href={`/racers/${side.ownerHandle}`} label={`@${side.ownerHandle}`} />
        <AppText variant="caption" tone="muted">
          {side.kitName} · revision {side.revisionNumber} · {formatDay(side.createdAt)}
        </AppText>
      </View>
      <AppText>{side.changeNote || 'No change note.'}</AppText>
      {revisionNumbers && onPickRevision && revisionNumbers.length > 1 ? (
        <ChoiceChips
          label={`Revision for “${position}”`}
          options={revisionNumbers.map((n) => ({ value: String(n), label: String(n), spoken: `Revision ${n}` }))}
          selected={[String(side.revisionNumber)]}
          onChange={([picked]) => onPickRevision(Number(picked))}
        />
      ) : null}
      <TextLink href={side.href} label={`Open ${side.title}`} />
    </Card>
  );
}

const styles = StyleSheet.create({
  bold: { fontWeight: '700', textTransform: 'uppercase' },
  meta: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.sm },
});
