import { useRef, useState } from 'react';
import { Pressable, StyleSheet, TextInput, View } from 'react-native';
import { formatLapTime, parseLapTime } from '../shared/compute/trackday';
import { MAX_LAPS_PER_RUN } from '../shared/types/trackdays';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { TextField } from './TextField';

export type LapEntryProps = {
  /** Lap times in seconds, in the order driven. */
  laps: readonly number[];
  onChange: (laps: number[]) => void;
  disabled?: boolean;
};

/** What is wrong with a typed lap time, or its seconds. */
export function readTypedLap(text: string, lapCount: number): { seconds: number } | { error: string } {
  const trimmed = text.trim();
  if (lapCount >= MAX_LAPS_PER_RUN) return { error: `A run holds at most ${MAX_LAPS_PER_RUN} laps.` };
  const read = parseLapTime(trimmed);
  return read.ok ? { seconds: read.seconds } : { error: `“${trimmed}” ${read.reason}.` };
}

function LapRow({ index, seconds, best, onRemove, disabled }: { index: number; seconds: number; best: boolean; onRemove: () => void; disabled?: boolean }) {
  const { colors } = useTheme();
  const time = formatLapTime(seconds);
  return (
    <View role="listitem" style={[styles.lap, index > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
      <AppText tone="muted" style={styles.lapNumber}>
        Lap {index + 1}
      </AppText>
      <AppText style={[styles.time, best ? styles.bold : null]}>
        {time}
        {best ? ' (best)' : ''}
      </AppText>
      <Pressable role="button" aria-label={`Remove lap ${index + 1}, ${time}`} onPress={onRemove} disabled={disabled} style={styles.remove}>
        <AppText tone="danger" variant="caption" style={styles.underline}>
          Remove
        </AppText>
      </Pressable>
    </View>
  );
}

/**
 * Fast lap entry for the pits: one field, Enter (or "Add lap") adds the lap and empties the field
 * for the next, keeping the keyboard up. Seconds (38.412) or minutes (1:02.345).
 */
export function LapEntry({ laps, onChange, disabled }: LapEntryProps) {
  const [text, setText] = useState('');
  const [error, setError] = useState<string | undefined>();
  const [announcement, setAnnouncement] = useState('');
  const input = useRef<TextInput>(null);
  const best = laps.length > 0 ? laps.indexOf(Math.min(...laps)) : -1;

  const add = () => {
    if (!text.trim()) {
      input.current?.focus();
      return;
    }
    const read = readTypedLap(text, laps.length);
    if ('error' in read) {
      setError(read.error);
      return;
    }
    onChange([...laps, read.seconds]);
    setText('');
    setError(undefined);
    setAnnouncement(`Lap ${laps.length + 1}: ${formatLapTime(read.seconds)} added.`);
    input.current?.focus();
  };
  const remove = (index: number) => {
    onChange(laps.filter((_, i) => i !== index));
    setAnnouncement(`Lap ${index + 1} removed; the laps after it moved up.`);
  };

  return (
    <View style={styles.group}>
      <TextField
        inputRef={input}
        label="Lap time"
        hint={`Lap ${laps.length + 1} next. Seconds (38.412) or minutes (1:02.345); Enter adds it.`}
        value={text}
        onChangeText={(value) => {
          setText(value);
          if (error) setError(undefined);
        }}
        error={error}
        editable={!disabled}
        // Not the decimal pad: it has no colon for 1:02.345.
        keyboardType="numbers-and-punctuation"
        returnKeyType="next"
        submitBehavior="submit"
        blurOnSubmit={false}
        onSubmitEditing={add}
        maxLength={12}
        autoCorrect={false}
        autoCapitalize="none"
      />
      <Button label="Add lap" variant="secondary" onPress={add} disabled={disabled} />
      <AppText role="status" aria-live="polite" variant="caption" tone="muted">
        {announcement}
      </AppText>
      {laps.length === 0 ? (
        <AppText tone="muted">No laps yet.</AppText>
      ) : (
        <View role="list" aria-label={`${laps.length} lap${laps.length === 1 ? '' : 's'} entered`}>
          {laps.map((seconds, i) => (
            <LapRow key={`${i}-${seconds}`} index={i} seconds={seconds} best={i === best} onRemove={() => remove(i)} disabled={disabled} />
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  lap: { minHeight: layout.minTouchTarget, flexDirection: 'row', alignItems: 'center', gap: space.md },
  lapNumber: { width: space.xxl * 2 },
  time: { flex: 1, fontVariant: ['tabular-nums'] },
  bold: { fontWeight: '700' },
  remove: { minHeight: layout.minTouchTarget, minWidth: layout.minTouchTarget, justifyContent: 'center', alignItems: 'flex-end' },
  underline: { textDecorationLine: 'underline' },
});
