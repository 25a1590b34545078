import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { MODERATION_ACTIONS, REPORT_TARGET_TYPES, REPORT_TARGET_LABELS } from '../shared/types/moderation';
import { space } from '../theme';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { TextField } from './TextField';

export type AuditFilterValues = { actor: string; action: string; targetType: string };

export type AuditFiltersProps = { value: AuditFilterValues; onChange: (next: AuditFilterValues) => void };

const ANY = '';
// Role and account entries are written by the admin screens and by racers filing reports or appeals.
const OTHER_ACTIONS = ['role-change', 'admin-suspend', 'admin-unsuspend', 'appeal-filed', 'report-filed'];
const ACTIONS = [{ value: ANY, label: 'Any action' }, ...[...MODERATION_ACTIONS, ...OTHER_ACTIONS].map((value) => ({ value, label: value }))];
// Role changes and suspensions are logged on the racer.
const TYPES = [{ value: ANY, label: 'Anything' }, ...REPORT_TARGET_TYPES.map((value) => ({ value: value as string, label: REPORT_TARGET_LABELS[value] }))];

/** Who (a handle), what action and on what kind of thing; the action and type lists fold away on phones. */
export function AuditFilters({ value, onChange }: AuditFiltersProps) {
  const [open, setOpen] = useState(false);
  const on = [value.action, value.targetType].filter(Boolean).length;
  return (
    <View style={styles.stack}>
      <TextField
        label="Who acted"
        hint="A moderator's or admin's handle."
        value={value.actor}
        onChangeText={(actor) => onChange({ ...value, actor })}
        autoCapitalize="none"
        autoCorrect={false}
      />
      <Button label={open ? 'Hide filters' : on > 0 ? `Action and type (${on} on)` : 'Action and type'} variant="secondary" onPress={() => setOpen((o) => !o)} />
      {open ? (
        <>
          <ChoiceChips label="Action" options={ACTIONS} selected={[value.action]} onChange={([action]) => onChange({ ...value, action: action ?? ANY })} />
          <ChoiceChips label="On" options={TYPES} selected={[value.targetType]} onChange={([targetType]) => onChange({ ...value, targetType: targetType ?? ANY })} />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
});
