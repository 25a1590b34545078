import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { SetupDetail } from '../shared/types/setups';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { CarStockBadge } from './CarStockBadge';
import { conditionParts, formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';
import { VisibilityBadge } from './VisibilityBadge';

export type SetupOverviewProps = { setup: SetupDetail; units: UnitPreferences };

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.fact}>
      <AppText variant="caption" tone="muted">
        {label}
      </AppText>
      {children}
    </View>
  );
}

/** Whose setup this is, for which car, and what it was built for. */
export function SetupOverview({ setup, units }: SetupOverviewProps) {
  const { isWide } = useTheme();
  const conditions = conditionParts(setup.conditions, units);
  const revision = setup.currentRevision;
  return (
    <Card>
      <View style={styles.badges}>
        <VisibilityBadge visibility={setup.visibility} />
        {setup.car.stock ? <CarStockBadge /> : null}
      </View>
      <View style={isWide ? styles.factsWide : styles.facts}>
        <Fact label="Car">
          <AppText>
            {setup.car.nickname} · {setup.car.makerName} {setup.car.kitName} · {vehicleClassLabel(setup.vehicleClass)}
          </AppText>
        </Fact>
        <Fact label="By">
          <TextLink href={`/racers/${setup.owner.handle}`} label={`${setup.owner.displayName} (@${setup.owner.handle})`} />
        </Fact>
        <Fact label="Built for">
          <AppText>{conditions.length > 0 ? conditions.join(' · ') : 'Any track and weather'}</AppText>
        </Fact>
        <Fact label="Current revision">
          <AppText>
            Revision {revision.number}, saved {formatDay(revision.createdAt)}
          </AppText>
        </Fact>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  facts: { gap: space.sm },
  // Four facts in two or four columns on wide screens instead of a tall stack.
  factsWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.sm },
  fact: { gap: 2, minWidth: layout.contentMaxWidth / 3, flexShrink: 1 },
});
