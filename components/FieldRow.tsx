import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import type { NumericField } from '../hooks/editor';
import type { SetupFieldValue, TemplateField } from '../shared/types/templates';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { FieldChoicePicker } from './FieldChoicePicker';
import { FieldHolePicker } from './FieldHolePicker';
import { FieldMessages } from './FieldMessages';
import { FieldSwitch } from './FieldSwitch';
import { FieldTextInput } from './FieldTextInput';
import { StepperField } from './StepperField';

export type FieldHandlers = {
  onValue: (key: string, value: SetupFieldValue | undefined) => void;
  onText: (field: NumericField, text: string) => void;
  onFinishTyping: (field: NumericField) => void;
  onStep: (field: NumericField, direction: 1 | -1) => void;
};

export type FieldRowProps = {
  field: TemplateField;
  value: SetupFieldValue | undefined;
  /** What a number input shows: the text being typed, or the stored value in the racer's unit. */
  text: string;
  /** The racer's unit for number fields ("in", "°F", "cSt"); empty for plain counts and non-numbers. */
  unitLabel: string;
  error?: string;
  warning?: string;
  /** The value before this edit, in words; present only when the field changed. */
  previous?: string;
  handlers: FieldHandlers;
};

function Control({ field, value, text, unitLabel, error, handlers }: FieldRowProps) {
  switch (field.type) {
    case 'number':
    case 'integer':
      return (
        <StepperField
          label={field.label}
          unitLabel={unitLabel}
          text={text}
          onChangeText={(t) => handlers.onText(field, t)}
          onBlur={() => handlers.onFinishTyping(field)}
          onStep={(direction) => handlers.onStep(field, direction)}
          canDecrease={typeof value !== 'number' || value > field.min}
          canIncrease={typeof value !== 'number' || value < field.max}
          allowNegative={field.min < 0}
          invalid={Boolean(error)}
        />
      );
    case 'position':
      return <FieldHolePicker label={field.label} min={field.min} max={field.max} value={typeof value === 'number' ? value : undefined} onChange={(hole) => handlers.onValue(field.key, hole)} />;
    case 'choice':
      return <FieldChoicePicker label={field.label} options={field.options} value={typeof value === 'string' ? value : undefined} onChange={(v) => handlers.onValue(field.key, v)} />;
    case 'boolean':
      return <FieldSwitch label={field.label} value={typeof value === 'boolean' ? value : undefined} onChange={(v) => handlers.onValue(field.key, v)} />;
    case 'text':
      return (
        <FieldTextInput
          label={field.label}
          value={typeof value === 'string' ? value : ''}
          maxLength={field.maxLength}
          onChangeText={(t) => handlers.onValue(field.key, t === '' ? undefined : t)}
          invalid={Boolean(error)}
        />
      );
  }
}

/** One setting of the sheet: its name and unit, a help toggle, the control, and what to know about the value. */
export function FieldRow(props: FieldRowProps) {
  const { field, unitLabel, error, warning, previous } = props;
  const { colors } = useTheme();
  const [helpOpen, setHelpOpen] = useState(false);
  return (
    <View style={styles.field}>
      <View style={styles.labelRow}>
        <AppText style={styles.label}>
          {field.label}
          {unitLabel && !field.label.endsWith(unitLabel) ? <AppText tone="muted"> ({unitLabel})</AppText> : null}
        </AppText>
        <Pressable
          role="button"
          aria-label={`About ${field.label.charAt(0).toLowerCase()}${field.label.slice(1)}`}
          aria-expanded={helpOpen}
          onPress={() => setHelpOpen((open) => !open)}
          style={styles.helpTarget}
        >
          <View style={[styles.helpIcon, { borderColor: colors.accent, backgroundColor: helpOpen ? colors.accentSoft : 'transparent' }]}>
            <AppText variant="caption" style={{ color: colors.accent, fontWeight: '700' }} aria-hidden>
              ?
            </AppText>
          </View>
        </Pressable>
      </View>
      <Control {...props} />
      <FieldMessages error={error} warning={warning} previous={previous} help={helpOpen ? field.help : undefined} />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, flexBasis: 150, flexGrow: 1, minWidth: 0 },
  labelRow: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  label: { flexShrink: 1, fontWeight: '700' },
  helpTarget: { width: layout.minTouchTarget, height: layout.minTouchTarget, alignItems: 'center', justifyContent: 'center', marginLeft: 'auto' },
  helpIcon: { width: space.xl, height: space.xl, borderRadius: radius.pill, borderWidth: 1, alignItems: 'center', justifyContent: 'center' },
});
