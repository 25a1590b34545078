import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { compareRunsHref, runName } from '../hooks/trackDays';
import type { Run } from '../shared/types/trackdays';
import { space } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { ChoiceChips } from './ChoiceChips';

export type RunComparePickerProps = { runs: readonly Run[] };

/** Two runs of the day to put side by side; the last two by default, the earlier one as the baseline. */
export function RunComparePicker({ runs }: RunComparePickerProps) {
  // null follows the day's last two runs, so a run just added is compared by default.
  const [pickedA, setA] = useState<number | null>(null);
  const [pickedB, setB] = useState<number | null>(null);
  if (runs.length < 2) return null;
  const has = (id: number | null) => runs.some((run) => run.id === id);
  const a = has(pickedA) ? pickedA! : runs[runs.length - 2].id;
  const b = has(pickedB) ? pickedB! : runs[runs.length - 1].id;
  const options = runs.map((run, i) => ({
    value: String(run.id),
    label: runName(run, i),
    spoken: `${runName(run, i)}, revision ${run.revision.number}`,
  }));
  const same = a === b;
  return (
    <Card role="region" aria-label="Compare two runs">
      <AppText variant="heading">Did the change help?</AppText>
      <AppText tone="muted">Pick the run before the change as A and the run with it as B.</AppText>
      <View style={styles.group}>
        <ChoiceChips label="A, the baseline" options={options} selected={[String(a)]} onChange={([id]) => setA(Number(id))} />
        <ChoiceChips label="B, with the change" options={options} selected={[String(b)]} onChange={([id]) => setB(Number(id))} />
        {same ? (
          <AppText tone="caution" role="alert">
            A and B are the same run: pick two different ones.
          </AppText>
        ) : (
          <ButtonLink href={compareRunsHref(a, b)} label="Compare A and B" />
        )}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
});
