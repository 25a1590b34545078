import { StyleSheet, Switch, View } from 'react-native';
import {
  EMAIL_TYPE_LABELS,
  NOTIFICATION_TYPES,
  type EmailDelivery,
  type EmailPreferences,
  type EmailPreferencesUpdate,
  type NotificationType,
} from '../shared/types/community';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';
import { FormErrorBanner } from './FormErrorBanner';
import { StatusNote } from './StatusNote';

export type EmailPreferencesFormProps = {
  preferences: EmailPreferences;
  /** Notification mail goes only to a confirmed address; until then the form says so. */
  emailConfirmed: boolean;
  /** Each change is saved at once, as one partial update. */
  onChange: (update: EmailPreferencesUpdate) => void;
  disabled?: boolean;
  error?: string | null;
  savedMessage?: string | null;
};

const DELIVERIES: readonly ChoiceOption<EmailDelivery>[] = [
  { value: 'immediate', label: 'Each time', spoken: 'One e-mail each time something happens' },
  { value: 'daily-digest', label: 'Once a day', spoken: 'One digest e-mail a day' },
];

const TYPES: readonly ChoiceOption<NotificationType>[] = NOTIFICATION_TYPES.map((type) => ({ value: type, label: EMAIL_TYPE_LABELS[type] }));

const MASTER_LABEL = 'Send me notification e-mail';

/** Which events Tunefork e-mails a racer about, and whether one by one or as a daily digest. */
export function EmailPreferencesForm({ preferences, emailConfirmed, onChange, disabled, error, savedMessage }: EmailPreferencesFormProps) {
  const { colors } = useTheme();
  const chosen = TYPES.map((t) => t.value).filter((type) => preferences.types[type]);
  // Only the type that was pressed is sent, so a save never overwrites a choice made elsewhere.
  const toggle = (selected: NotificationType[]) => {
    const pressed = TYPES.find((t) => selected.includes(t.value) !== preferences.types[t.value]);
    if (pressed) onChange({ types: { [pressed.value]: selected.includes(pressed.value) } });
  };
  const off = disabled || !preferences.enabled;
  return (
    <View style={styles.form}>
      {emailConfirmed ? null : (
        <StatusNote tone="caution" message="Confirm your e-mail address first: notification e-mail only goes to a confirmed address." />
      )}
      <View style={styles.switchRow}>
        <Switch
          aria-label={MASTER_LABEL}
          value={preferences.enabled}
          onValueChange={(enabled) => onChange({ enabled })}
          disabled={disabled}
          trackColor={{ true: colors.accent, false: colors.border }}
          thumbColor={colors.surface}
        />
        <AppText aria-hidden style={styles.switchLabel}>
          {MASTER_LABEL}
        </AppText>
      </View>
      {preferences.enabled ? null : (
        <AppText tone="muted">Notification e-mail is off. Account e-mail (address checks, password resets) still arrives.</AppText>
      )}
      <ChoiceChips
        label="How often"
        options={DELIVERIES}
        selected={[preferences.delivery]}
        onChange={([delivery]) => onChange({ delivery })}
        disabled={off}
      />
      <ChoiceChips label="E-mail me about" options={TYPES} selected={chosen} multiple onChange={toggle} disabled={off} />
      <FormErrorBanner message={error} />
      <StatusNote message={savedMessage} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  switchRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: layout.minTouchTarget },
  switchLabel: { flexShrink: 1, fontWeight: '700' },
});
