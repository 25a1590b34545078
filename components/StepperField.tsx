import { useState } from 'react';
import { Pressable, StyleSheet, TextInput, View } from 'react-native';
import { layout, radius, space, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';

export type StepperFieldProps = {
  /** The field's name as a sentence start ("Front shock oil"); the buttons say "Decrease front shock oil". */
  label: string;
  /** Spoken with the input so the unit is never only visual. */
  unitLabel: string;
  text: string;
  onChangeText: (text: string) => void;
  onBlur: () => void;
  onStep: (direction: 1 | -1) => void;
  canDecrease: boolean;
  canIncrease: boolean;
  /** Fields such as camber and toe go below zero; phone number pads without a minus key cannot type them. */
  allowNegative?: boolean;
  invalid?: boolean;
};

/** A number typed in the racer's unit, with − and + buttons that move by the field's step. */
export function StepperField(props: StepperFieldProps) {
  const { label, unitLabel, text, onChangeText, onBlur, onStep, canDecrease, canIncrease, allowNegative, invalid } = props;
  const { colors } = useTheme();
  // In a narrow column (front and rear side by side on a phone) the buttons move under the input,
  // so a six-digit diff oil still shows in full.
  const [compact, setCompact] = useState(false);
  const lower = label.charAt(0).toLowerCase() + label.slice(1);
  const button = (direction: 1 | -1, enabled: boolean) => (
    <Pressable
      role="button"
      aria-label={`${direction === 1 ? 'Increase' : 'Decrease'} ${lower}`}
      aria-disabled={!enabled}
      disabled={!enabled}
      onPress={() => onStep(direction)}
      style={({ pressed }) => [
        styles.step,
        compact ? styles.stepCompact : null,
        { borderColor: colors.accent, backgroundColor: pressed ? colors.accentSoft : colors.surface, opacity: enabled ? 1 : 0.4 },
      ]}
    >
      <AppText variant="heading" aria-hidden style={{ color: colors.accent }}>
        {direction === 1 ? '+' : '−'}
      </AppText>
    </Pressable>
  );
  const input = (
    <TextInput
      aria-label={unitLabel ? `${label}, in ${unitLabel}` : label}
      aria-invalid={invalid}
      value={text}
      onChangeText={onChangeText}
      onBlur={onBlur}
      inputMode={allowNegative ? 'text' : 'decimal'}
      keyboardType={allowNegative ? 'numbers-and-punctuation' : 'decimal-pad'}
      autoCorrect={false}
      selectTextOnFocus
      style={[
        styles.input,
        typeScale.body,
        { color: colors.text, backgroundColor: colors.surface, borderColor: invalid ? colors.danger : colors.border },
        invalid ? styles.invalid : null,
        compact ? styles.inputCompact : null,
      ]}
    />
  );
  return (
    <View style={[styles.box, compact ? styles.column : styles.row]} onLayout={(e) => setCompact(e.nativeEvent.layout.width < COMPACT_BELOW)}>
      {compact ? (
        <>
          {input}
          <View style={styles.row}>
            {button(-1, canDecrease)}
            {button(1, canIncrease)}
          </View>
        </>
      ) : (
        <>
          {button(-1, canDecrease)}
          {input}
          {button(1, canIncrease)}
        </>
      )}
    </View>
  );
}

const COMPACT_BELOW = layout.minTouchTarget * 4 + space.sm;

const styles = StyleSheet.create({
  // Wide enough for any value; a full-width stepper on a wide screen only spreads the buttons apart.
  box: { width: '100%', maxWidth: layout.contentMaxWidth / 2 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  column: { gap: space.xs },
  stepCompact: { flex: 1 },
  step: {
    width: layout.minTouchTarget,
    height: layout.minTouchTarget,
    borderRadius: radius.md,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
  },
  input: {
    flexGrow: 1,
    flexShrink: 1,
    minWidth: 0,
    minHeight: layout.minTouchTarget,
    borderWidth: 1,
    borderRadius: radius.md,
    paddingHorizontal: space.sm,
    textAlign: 'center',
  },
  inputCompact: { flexGrow: 0 },
  // A thicker edge marks a problem by more than colour alone.
  invalid: { borderWidth: 2 },
});
