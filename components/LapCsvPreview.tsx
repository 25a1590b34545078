import { StyleSheet, View } from 'react-native';
import { formatLapTime, type LapCsvImport } from '../shared/compute/trackday';
import { MAX_LAPS_PER_RUN } from '../shared/types/trackdays';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';

export type LapCsvPreviewProps = {
  /** The file's name, or null for pasted rows. */
  source: string | null;
  result: LapCsvImport;
  onUse: (laps: number[]) => void;
  onDiscard: () => void;
};

/** Laps shown before the "and N more" line; the lap list shows them all once used. */
const SHOWN_LAPS = 20;

/** Lap numbers between the first and last that the file does not have, e.g. a lap the timing missed. */
export function missingLapNumbers(result: LapCsvImport): number[] {
  const numbers = new Set(result.laps.map((lap) => lap.lapNumber));
  const missing: number[] = [];
  const first = result.laps[0]?.lapNumber ?? 0;
  const last = result.laps[result.laps.length - 1]?.lapNumber ?? 0;
  for (let n = first + 1; n < last && missing.length <= SHOWN_LAPS; n += 1) if (!numbers.has(n)) missing.push(n);
  return missing;
}

function describeRead(source: string | null, result: LapCsvImport): string {
  const count = result.laps.length;
  const from = source ? `“${source}”` : 'the pasted rows';
  const header = result.hasHeader ? 'with a header row' : 'without a header row';
  const separator = result.separator === ';' ? 'semicolons' : 'commas';
  return `${count} lap${count === 1 ? '' : 's'} read from ${from}, ${header}, columns split by ${separator}.`;
}

/** What a lap file held before anything is saved: the laps read, and each row that could not be read. */
export function LapCsvPreview({ source, result, onUse, onDiscard }: LapCsvPreviewProps) {
  const { colors } = useTheme();
  const laps = result.laps;
  const missing = missingLapNumbers(result);
  const tooMany = laps.length > MAX_LAPS_PER_RUN;
  return (
    <Card role="region" aria-label="What the file holds">
      <AppText style={styles.bold}>{describeRead(source, result)}</AppText>
      {laps.length > 0 ? (
        <View role="list" aria-label="Laps read">
          {laps.slice(0, SHOWN_LAPS).map((lap) => (
            <AppText key={lap.row} role="listitem" style={styles.numbers}>
              Lap {lap.lapNumber}: {formatLapTime(lap.seconds)}
            </AppText>
          ))}
          {laps.length > SHOWN_LAPS ? <AppText tone="muted">…and {laps.length - SHOWN_LAPS} more laps.</AppText> : null}
        </View>
      ) : null}
      {missing.length > 0 ? (
        <AppText tone="caution">Lap numbers missing from the file: {missing.join(', ')}. The laps are kept in lap-number order.</AppText>
      ) : null}
      {result.errors.length > 0 ? (
        <View role="alert" style={[styles.errors, { borderColor: colors.danger, backgroundColor: colors.dangerSoft }]}>
          <AppText style={[styles.bold, { color: colors.danger }]}>
            {result.errors.length} row{result.errors.length === 1 ? '' : 's'} could not be read and will be left out:
          </AppText>
          <View role="list">
            {result.errors.map((error) => (
              <AppText key={error.row} role="listitem" style={{ color: colors.text }}>
                • {error.message.charAt(0).toUpperCase() + error.message.slice(1)}
              </AppText>
            ))}
          </View>
          <AppText variant="caption" style={{ color: colors.text }}>
            Row numbers count every line of the file, header and blank lines included. Fix them and read the file again to keep them.
          </AppText>
        </View>
      ) : null}
      {tooMany ? (
        <AppText tone="danger" role="alert">
          A run holds at most {MAX_LAPS_PER_RUN} laps; this file has {laps.length}. Split it into one file per run.
        </AppText>
      ) : null}
      <View style={styles.buttons}>
        {laps.length > 0 && !tooMany ? (
          <Button label={`Use these ${laps.length} lap${laps.length === 1 ? '' : 's'}`} onPress={() => onUse(laps.map((lap) => lap.seconds))} />
        ) : null}
        <Button label="Discard" variant="secondary" accessibilityLabel="Discard what was read" onPress={onDiscard} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  bold: { fontWeight: '700' },
  numbers: { fontVariant: ['tabular-nums'] },
  errors: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md, gap: space.xs },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
