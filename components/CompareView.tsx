import type { CompareRow, SheetComparison } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { fieldsByKey, getTemplate, type TemplateField } from '../shared/types/templates';
import { vehicleClassLabel, type VehicleClassKey } from '../shared/types/vehicleClasses';
import { AppText } from './AppText';
import { Card } from './Card';
import { CompareFigures } from './CompareFigures';
import { CompareOneSide } from './CompareOneSide';
import { valueText, type CompareDisplayRow } from './CompareRows';
import { CompareSection } from './CompareSection';

export type CompareViewProps = {
  comparison: SheetComparison;
  classes: { a: VehicleClassKey; b: VehicleClassKey };
  /** Short names of the two sides, e.g. "Revision 3" and "Revision 5". */
  columns: { a: string; b: string };
  units: UnitPreferences;
  /** A side-by-side table on wide windows; stacked lines on phones. */
  wide: boolean;
};

/** Each side's value read through its own class's field, so choices and units read right on both. */
export function displayRows(
  rows: CompareRow[],
  fields: { a: ReadonlyMap<string, TemplateField>; b: ReadonlyMap<string, TemplateField> },
  units: UnitPreferences,
): CompareDisplayRow[] {
  return rows.map((row) => ({
    key: row.key,
    label: row.label,
    a: valueText(fields.a.get(row.key), row.a, units),
    b: valueText(fields.b.get(row.key), row.b, units),
    changed: row.changed,
  }));
}

function Verdict({ comparison, classes }: Pick<CompareViewProps, 'comparison' | 'classes'>) {
  const n = comparison.changedCount;
  const crossClass = classes.a !== classes.b;
  return (
    <Card role="status">
      <AppText variant="heading">{n === 0 ? 'Nothing changed' : `${n} setting${n === 1 ? '' : 's'} changed`}</AppText>
      {n === 0 ? <AppText tone="muted">Every setting both sheets have holds the same value on each.</AppText> : null}
      {crossClass ? (
        <AppText tone="muted">
          A {vehicleClassLabel(classes.a)} against a {vehicleClassLabel(classes.b)}: settings only one of them has are listed apart, not
          counted as changes.
        </AppText>
      ) : null}
    </Card>
  );
}

/** The whole comparison: verdict, computed figures, section by section, then what only one side has. */
export function CompareView({ comparison, classes, columns, units, wide }: CompareViewProps) {
  const fields = { a: fieldsByKey(getTemplate(classes.a)), b: fieldsByKey(getTemplate(classes.b)) };
  const oneSided = comparison.onlyInA.length + comparison.onlyInB.length > 0;
  return (
    <>
      <Verdict comparison={comparison} classes={classes} />
      <CompareFigures rows={comparison.computed} units={units} wide={wide} columns={columns} />
      <Card>
        <AppText variant="heading">Settings</AppText>
        {comparison.sections.length === 0 ? (
          <AppText tone="muted">Neither sheet has values in the settings they share.</AppText>
        ) : (
          comparison.sections.map((section, i) => (
            <CompareSection
              key={section.key}
              title={section.title}
              rows={displayRows(section.rows, fields, units)}
              wide={wide}
              columns={columns}
              ruled={i > 0}
            />
          ))
        )}
      </Card>
      {oneSided ? (
        <Card>
          <AppText variant="heading">Not compared</AppText>
          <CompareOneSide sideName={columns.a} fields={comparison.onlyInA} vehicleClass={classes.a} units={units} />
          <CompareOneSide sideName={columns.b} fields={comparison.onlyInB} vehicleClass={classes.b} units={units} />
        </Card>
      ) : null}
    </>
  );
}
