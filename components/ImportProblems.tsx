import { StyleSheet } from 'react-native';
import { ApiRequestError } from '../hooks/api';
import { fieldsByKey, getTemplate } from '../shared/types/templates';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { AppText } from './AppText';
import { Card } from './Card';

export type ImportProblemsProps = {
  error: unknown;
  /** The file's class when it could be read, so sheet field keys can be shown by their labels. */
  vehicleClass: VehicleClassKey | null;
};

/** "values.gear.spur" → "Spur gear"; "document.setup.title" → "setup.title". */
function placeName(path: string, vehicleClass: VehicleClassKey | null): string {
  const fields = vehicleClass ? fieldsByKey(getTemplate(vehicleClass)) : null;
  const key = path.replace(/^(values|document\.setup\.values)\./, '');
  const field = fields?.get(key) ?? fields?.get(path);
  if (field) return field.label;
  if (path === 'carId') return 'Car';
  if (key !== path) return 'Sheet';
  return path.replace(/^document\./, '') || 'File';
}

/** Why the server refused a setup file, with one line per field it named. */
export function ImportProblems({ error, vehicleClass }: ImportProblemsProps) {
  if (!error) return null;
  const message = error instanceof Error ? error.message : 'The file could not be imported. Try again.';
  const details = error instanceof ApiRequestError && error.details ? Object.entries(error.details) : [];
  return (
    <Card>
      <AppText variant="heading" tone="danger">
        The file was not imported
      </AppText>
      {/* One announced text holding every reason, so screen readers read them all out at once. */}
      <AppText role="alert">
        {message}
        {details.map(([path, why]) => (
          <AppText key={path}>
            {'\n• '}
            <AppText style={styles.place}>{placeName(path, vehicleClass)}: </AppText>
            {typeof why === 'string' ? why : JSON.stringify(why)}
          </AppText>
        ))}
      </AppText>
    </Card>
  );
}

const styles = StyleSheet.create({
  place: { fontWeight: '700' },
});
