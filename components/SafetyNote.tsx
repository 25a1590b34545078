import { StyleSheet, View } from 'react-native';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../shared/types/vehicleClasses';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type SafetyNoteProps = {
  vehicleClass: VehicleClassKey;
  /** One paragraph for the printed pit sheet instead of a list. */
  compact?: boolean;
};

const NITRO_LINES = [
  'Nitro fuel is toxic and catches fire easily: keep it capped, away from heat and flames, and off your skin.',
  'Glow igniters, engines and exhaust pipes get hot enough to burn; let them cool before you handle them.',
];

const BATTERY_LINES = [
  'Charge LiPo and LiHV packs only on a charger set up for them, inside a fire-safe bag, and stay with them while they charge.',
];

const SHARED_LINES = [
  'Cutting or sanding carbon-fibre parts makes harmful dust: cut them wet and wear a mask.',
  'Keep fingers, hair and loose sleeves clear of a spinning drivetrain, and hold the car off the ground when running it on the bench.',
];

const DEFER_LINE =
  'The numbers here are starting points. The manufacturer’s instructions, your track’s rules and local regulations come first.';

/** The cautions that apply to this class: nitro lines for nitro cars, battery lines for electric ones. */
export function safetyLines(vehicleClass: VehicleClassKey): string[] {
  const power = VEHICLE_CLASSES.find((c) => c.key === vehicleClass)?.power;
  return [...(power === 'nitro' ? NITRO_LINES : BATTERY_LINES), ...SHARED_LINES, DEFER_LINE];
}

/** Safety cautions beside a setup, because a sheet tells people to mix fuel, charge packs and cut parts. */
export function SafetyNote({ vehicleClass, compact }: SafetyNoteProps) {
  const { colors } = useTheme();
  const lines = safetyLines(vehicleClass);
  return (
    <View role="note" aria-label="Safety" style={[styles.note, { backgroundColor: colors.cautionSoft, borderColor: colors.caution }]}>
      {compact ? (
        <AppText variant="caption" style={{ color: colors.text }}>
          <AppText variant="caption" style={[styles.bold, { color: colors.caution }]}>
            Safety:{' '}
          </AppText>
          {lines.join(' ')}
        </AppText>
      ) : (
        <>
          <AppText variant="heading" aria-level={3} style={{ color: colors.caution }}>
            Safety in the pits
          </AppText>
          <View role="list" style={styles.list}>
            {lines.map((line) => (
              <AppText key={line} role="listitem" style={{ color: colors.text }}>
                • {line}
              </AppText>
            ))}
          </View>
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  note: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md, gap: space.sm },
  list: { gap: space.xs },
  bold: { fontWeight: '700' },
});
