import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { StoredSetupValues } from '../shared/types/setups';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { space, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { joinLabels, summaryLines, type SummaryLine } from './SummaryFigures';

export type SummaryCardProps = {
  vehicleClass: VehicleClassKey;
  values: StoredSetupValues;
  units: UnitPreferences;
};

function Line({ line, first }: { line: Exclude<SummaryLine, { state: 'unavailable' }>; first: boolean }) {
  const { colors } = useTheme();
  return (
    <View role="listitem" style={[styles.line, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      <View style={styles.pair}>
        <AppText style={styles.label}>{line.label}</AppText>
        {/* Heading-sized but not a heading: a figure, not a section title. */}
        {line.state === 'value' ? <AppText style={[typeScale.heading, styles.value]}>{line.text}</AppText> : null}
      </View>
      {line.state === 'missing' ? (
        <AppText variant="caption" tone="muted">
          Fill in {joinLabels(line.fieldLabels)} to see this.
        </AppText>
      ) : null}
    </View>
  );
}

/** The trade's arithmetic on this sheet: ratios, rollout, toe and top speed, or what to fill in first. */
export function SummaryCard({ vehicleClass, values, units }: SummaryCardProps) {
  const lines = summaryLines(vehicleClass, values, units);
  const shown = lines.filter((l): l is Exclude<SummaryLine, { state: 'unavailable' }> => l.state !== 'unavailable');
  const left = lines.filter((l) => l.state === 'unavailable').map((l) => l.label.toLowerCase());
  return (
    <Card>
      <AppText variant="heading">Worked out from this sheet</AppText>
      <View role="list">
        {shown.map((line, i) => (
          <Line key={line.key} line={line} first={i === 0} />
        ))}
      </View>
      {left.length > 0 ? (
        <AppText variant="caption" tone="muted">
          Not worked out for this class, whose sheet has no fields for them: {joinLabels(left)}.
        </AppText>
      ) : null}
      <AppText variant="caption" tone="muted">
        Starting points from the numbers on the sheet; tires, load and wear change what happens on track.
      </AppText>
    </Card>
  );
}

const styles = StyleSheet.create({
  line: { paddingVertical: space.sm, gap: 2 },
  pair: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', columnGap: space.md },
  label: { fontWeight: '700', flexShrink: 1 },
  value: { textAlign: 'right' },
});
