import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import {
  REPORT_REASON_LABELS,
  REPORT_REASONS,
  REPORT_TARGET_LABELS,
  REPORT_TARGET_TYPES,
  type ReportReason,
  type ReportTargetType,
} from '../shared/types/moderation';
import { space } from '../theme';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';

export type QueueFilterValues = {
  kind: 'all' | 'reports' | 'appeals';
  order: 'oldest' | 'newest';
  reason?: ReportReason;
  type?: ReportTargetType;
};

export type QueueFiltersProps = { value: QueueFilterValues; onChange: (next: QueueFilterValues) => void };

const KINDS = [
  { value: 'all', label: 'Everything' },
  { value: 'reports', label: 'Reports' },
  { value: 'appeals', label: 'Appeals' },
] as const;
const ORDERS = [
  { value: 'oldest', label: 'Oldest first' },
  { value: 'newest', label: 'Newest first' },
] as const;
const ANY = 'any';
const REASONS = [{ value: ANY, label: 'Any reason' }, ...REPORT_REASONS.map((value) => ({ value, label: REPORT_REASON_LABELS[value].label }))];
const TYPES = [{ value: ANY, label: 'Anything' }, ...REPORT_TARGET_TYPES.map((value) => ({ value, label: REPORT_TARGET_LABELS[value] }))];

/** How many filters differ from the queue's defaults. */
export function activeFilterCount(value: QueueFilterValues): number {
  return [value.reason, value.type, value.order === 'newest' ? value.order : undefined].filter(Boolean).length;
}

/** Reports or appeals always in view; reason, type and order one tap away to keep the phone screen short. */
export function QueueFilters({ value, onChange }: QueueFiltersProps) {
  const [open, setOpen] = useState(false);
  const active = activeFilterCount(value);
  return (
    <View style={styles.stack}>
      <ChoiceChips label="Show" hideLabel options={KINDS} selected={[value.kind]} onChange={([kind]) => kind && onChange({ ...value, kind })} />
      <Button
        label={open ? 'Hide filters' : active > 0 ? `More filters (${active} on)` : 'More filters'}
        variant="secondary"
        onPress={() => setOpen((o) => !o)}
      />
      {open ? (
        <>
          <ChoiceChips
            label="Reason"
            options={REASONS}
            selected={[value.reason ?? ANY]}
            onChange={([reason]) => onChange({ ...value, reason: reason === ANY ? undefined : (reason as ReportReason) })}
          />
          <ChoiceChips
            label="What was reported"
            options={TYPES}
            selected={[value.type ?? ANY]}
            onChange={([type]) => onChange({ ...value, type: type === ANY ? undefined : (type as ReportTargetType) })}
          />
          <ChoiceChips label="Order" options={ORDERS} selected={[value.order]} onChange={([order]) => order && onChange({ ...value, order })} />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
});
