import { compareSheets, diffSetupValues } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import type { StoredSetupValues } from '../shared/types/setups';
import { fieldsByKey, getTemplate } from '../shared/types/templates';
import { vehicleClassKeySchema } from '../shared/types/vehicleClasses';
import { AppText } from './AppText';
import { Card } from './Card';
import { CompareRows, type CompareDisplayRow } from './CompareRows';
import { displayRows } from './CompareView';
import { StatusNote } from './StatusNote';

/** The sheet one run used. */
export type RunSheet = { setupId: number; setupTitle: string; revisionId: number; revisionNumber: number; vehicleClass: string; values: StoredSetupValues };

export type RunRevisionDiffProps = { a: RunSheet; b: RunSheet; units: UnitPreferences; wide: boolean };

/** The settings that differ between the two sheets, in the viewer's words and units. */
export function changedSettings(a: RunSheet, b: RunSheet, units: UnitPreferences): CompareDisplayRow[] {
  const classA = vehicleClassKeySchema.safeParse(a.vehicleClass);
  const classB = vehicleClassKeySchema.safeParse(b.vehicleClass);
  if (!classA.success || !classB.success) {
    // A class this app does not know yet: the stored values, compared as they are.
    return diffSetupValues(a.values, b.values).map((c) => ({ key: c.key, label: c.key, a: String(c.before ?? 'Not set'), b: String(c.after ?? 'Not set'), changed: true }));
  }
  const comparison = compareSheets({ vehicleClass: classA.data, values: a.values }, { vehicleClass: classB.data, values: b.values });
  const fields = { a: fieldsByKey(getTemplate(classA.data)), b: fieldsByKey(getTemplate(classB.data)) };
  const changed = comparison.sections.flatMap((section) => section.rows.filter((row) => row.changed));
  return displayRows(changed, fields, units);
}

function verdictOnChanges(a: RunSheet, b: RunSheet, count: number): { text: string; warn: boolean } {
  if (a.revisionId === b.revisionId) {
    return { text: `Both runs used revision ${a.revisionNumber} of “${a.setupTitle}”: nothing on the sheet changed, so any difference came from the driver, the track or chance.`, warn: false };
  }
  if (count === 0) return { text: 'No setting differs between the two sheets.', warn: false };
  if (count === 1) return { text: 'One setting changed between the runs: the verdict above is about this change.', warn: false };
  return { text: `${count} settings changed between these runs: the laps cannot say which change helped. Change one thing at a time to find out.`, warn: true };
}

/** What changed on the sheet between run A and run B, with a warning when it was more than one thing. */
export function RunRevisionDiff({ a, b, units, wide }: RunRevisionDiffProps) {
  const rows = changedSettings(a, b, units);
  const said = verdictOnChanges(a, b, rows.length);
  const sameSetup = a.setupId === b.setupId;
  const columns = sameSetup
    ? { a: `A: revision ${a.revisionNumber}`, b: `B: revision ${b.revisionNumber}` }
    : { a: `A: ${a.setupTitle} (rev ${a.revisionNumber})`, b: `B: ${b.setupTitle} (rev ${b.revisionNumber})` };
  return (
    <Card role="region" aria-label="What changed on the sheet">
      <AppText variant="heading">What changed on the sheet</AppText>
      {said.warn ? <StatusNote tone="caution" message={said.text} /> : <AppText tone="muted">{said.text}</AppText>}
      {rows.length > 0 ? <CompareRows rows={rows} wide={wide} columns={columns} label="Settings that differ between run A and run B" /> : null}
    </Card>
  );
}
