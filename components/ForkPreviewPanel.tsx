import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { allStockChoices, defaultStockChoices } from '../hooks/forks';
import type { UnitPreferences } from '../shared/types/auth';
import type { ForkPreview, StockChoice } from '../shared/types/forks';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { ForkFieldList } from './ForkFieldList';
import { ForkOptionParts } from './ForkOptionParts';
import { FormErrorBanner } from './FormErrorBanner';
import { formatSheetValue } from './LineageValue';

export type ForkPreviewPanelProps = {
  preview: ForkPreview;
  units: UnitPreferences;
  onConfirm: (stockChoices: Record<string, StockChoice>) => void;
  pending: boolean;
  /** A problem with the request as a whole, or with the option-part choices. */
  error: string | null;
};

function OptionPartNote({ preview }: { preview: ForkPreview }) {
  if (!preview.checkedOptionParts) {
    return <AppText tone="muted">Your car is the same kit and is not marked stock, so every value is copied as it is.</AppText>;
  }
  if (preview.optionParts.length === 0) {
    return <AppText tone="muted">Everything this setup uses comes in your kit’s box: no option parts to buy.</AppText>;
  }
  return null;
}

/**
 * What the copy will hold on the chosen car: option parts to keep or swap for stock, fields filled
 * from the kit's stock sheet and fields left out; then the button that makes the copy.
 */
export function ForkPreviewPanel({ preview, units, onConfirm, pending, error }: ForkPreviewPanelProps) {
  // Only what the racer changed is stored, so a refreshed preview still starts its new rows on the default.
  const [overrides, setOverrides] = useState<Record<string, StockChoice>>({});
  const choices = { ...defaultStockChoices(preview.optionParts, preview.target.stock), ...overrides };
  const { source, target } = preview;
  const targetValue = (key: string, value: ForkPreview['optionParts'][number]['value'] | null) =>
    formatSheetValue(target.vehicleClass, key, value, units) ?? 'not set';
  const filled = preview.filledFromStock.map((f) => ({
    key: f.key,
    label: f.label,
    section: f.section,
    detail: `stock ${targetValue(f.key, f.stockValue)}${f.value === null ? '' : ` (the original’s ${formatSheetValue(source.vehicleClass, f.key, f.value, units) ?? String(f.value)} does not fit your sheet)`}`,
  }));
  const dropped = preview.dropped.map((f) => ({
    key: f.key,
    label: f.label,
    section: f.section,
    detail: `the original has ${formatSheetValue(source.vehicleClass, f.key, f.value, units) ?? 'no value'}`,
  }));
  return (
    <Card role="region" aria-label="What your copy will hold">
      <View style={styles.body}>
        <AppText variant="heading">What your copy will hold</AppText>
        <AppText>
          Revision {source.revisionNumber} of “{source.title}” by @{source.ownerHandle} ({source.kitName}), on your {target.nickname} (
          {target.kitName}).
        </AppText>
        <OptionPartNote preview={preview} />
        {preview.optionParts.length > 0 ? (
          <ForkOptionParts
            parts={preview.optionParts}
            vehicleClass={target.vehicleClass}
            units={units}
            choices={choices}
            onChange={(key, choice) => setOverrides((prev) => ({ ...prev, [key]: choice }))}
            onSetAll={(choice) => setOverrides(allStockChoices(preview.optionParts, choice))}
            carIsStock={target.stock}
            disabled={pending}
          />
        ) : null}
        <ForkFieldList
          title="Filled from your kit’s stock sheet"
          description="The original has no value for these that your car’s sheet can hold, so your kit’s stock value is used."
          items={filled}
        />
        <ForkFieldList
          title="Dropped (your class’s sheet has no such field)"
          description="The original has these, but your car’s sheet has no place for them; they are left out of your copy."
          items={dropped}
        />
        <FormErrorBanner message={error} />
        <Button label="Start from this setup" busy={pending} busyLabel="Copying into your garage…" onPress={() => onConfirm(choices)} />
        <AppText variant="caption" tone="muted">
          Your copy is private until you share it. Later changes to the original can be taken one field at a time.
        </AppText>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.lg },
});
