import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { LAP_CSV_MAX_BYTES, LAP_CSV_MAX_ROWS, TrackdayInputError, parseLapCsv, type LapCsvImport as LapCsvResult } from '../shared/compute/trackday';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { ImportFileButton } from './ImportFileButton';
import { LapCsvPreview } from './LapCsvPreview';
import { TextField } from './TextField';

export type LapCsvImportProps = {
  /** Called with the laps read, in lap-number order, once the racer accepts the preview. */
  onUse: (laps: number[]) => void;
  disabled?: boolean;
};

const EXAMPLE = 'lap,time\n1,32.481\n2,31.907\n3,1:02.345';

function sentence(message: string): string {
  return message.charAt(0).toUpperCase() + message.slice(1) + (message.endsWith('.') ? '' : '.');
}

/** Our own lap file shape, written out where the racer picks the file. */
function CsvShape() {
  const { colors } = useTheme();
  return (
    <View style={styles.shape}>
      <AppText style={styles.bold}>The lap file Tunefork reads</AppText>
      <AppText tone="muted">
        A CSV file with a lap column and a time column, one lap per row. Times in seconds (32.481) or minutes and seconds (1:02.345). The
        header row is optional: without it the first column is the lap number and the second the time. Columns split by commas, or by
        semicolons (then 32,481 works too). At most {LAP_CSV_MAX_BYTES / 1024} KB and {LAP_CSV_MAX_ROWS.toLocaleString('en')} rows.
      </AppText>
      <View style={[styles.example, { backgroundColor: colors.surfaceRaised, borderColor: colors.border }]} aria-label="Example lap file">
        <AppText style={styles.mono}>{EXAMPLE}</AppText>
      </View>
    </View>
  );
}

/** Laps from a CSV file (or rows pasted from one), previewed with every bad row named before they are used. */
export function LapCsvImport({ onUse, disabled }: LapCsvImportProps) {
  const [pasted, setPasted] = useState('');
  const [read, setRead] = useState<{ source: string | null; result: LapCsvResult } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const readText = (text: string, source: string | null) => {
    try {
      setRead({ source, result: parseLapCsv(text) });
      setProblem(null);
    } catch (err) {
      if (!(err instanceof TrackdayInputError)) throw err;
      setRead(null);
      setProblem(`${source ? `“${source}”: ` : ''}${sentence(err.message)}`);
    }
  };
  const pickFile = async (file: File) => {
    // Checked before reading, so a huge file is refused without loading it into memory.
    if (file.size > LAP_CSV_MAX_BYTES) {
      setRead(null);
      setProblem(`“${file.name}” is larger than ${LAP_CSV_MAX_BYTES / 1024} KB: split it into smaller files.`);
      return;
    }
    readText(await file.text(), file.name);
  };
  const use = (laps: number[]) => {
    onUse(laps);
    setRead(null);
    setPasted('');
  };

  return (
    <View style={styles.group}>
      <CsvShape />
      <ImportFileButton label="Choose a lap file (CSV)" accept=".csv,text/csv,text/plain" onPick={(file) => void pickFile(file)} disabled={disabled} />
      <TextField
        label="Or paste the rows"
        value={pasted}
        onChangeText={setPasted}
        multiline
        autoCorrect={false}
        autoCapitalize="none"
        placeholder={EXAMPLE}
        editable={!disabled}
      />
      <Button label="Read the pasted rows" variant="secondary" onPress={() => readText(pasted, null)} disabled={disabled || !pasted.trim()} />
      <FormErrorBanner message={problem} />
      {read ? <LapCsvPreview source={read.source} result={read.result} onUse={use} onDiscard={() => setRead(null)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
  shape: { gap: space.xs },
  bold: { fontWeight: '700' },
  example: { borderWidth: 1, borderRadius: radius.sm, padding: space.sm },
  mono: { fontVariant: ['tabular-nums'] },
});
