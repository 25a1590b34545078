import { fireEvent, screen, within } from '@testing-library/react-native';
import { CompareView } from '../../components/CompareView';
import { RevisionChanges } from '../../components/RevisionChanges';
import { compareSheets } from '../../shared/compute/setup';
import { renderThemed } from './support/render';

/** Lists and tables are not accessibility elements on native, so find them by name and check their role. */
function byRole(role: 'list' | 'table', name: string) {
  const element = screen.getByLabelText(name);
  expect(element.props.role).toBe(role);
  return element;
}

const MM_C = { length: 'mm', temperature: 'C' } as const;
const IN_F = { length: 'in', temperature: 'F' } as const;

const BEFORE = { 'shock.rear.oil': 450, 'susp.front.ride-height': 27, 'shock.front.oil': 400, 'gear.spur': 46, 'gear.pinion': 17 };
const AFTER = { 'shock.rear.oil': 500, 'susp.front.ride-height': 26, 'shock.front.oil': 400, 'gear.spur': 46, 'gear.pinion': 17 };

function renderCompare(before: Record<string, number>, after: Record<string, number>, wide: boolean, units: typeof MM_C | typeof IN_F = MM_C) {
  const comparison = compareSheets({ vehicleClass: 'buggy-1-8-electric', values: before }, { vehicleClass: 'buggy-1-8-electric', values: after });
  renderThemed(
    <CompareView
      comparison={comparison}
      classes={{ a: 'buggy-1-8-electric', b: 'buggy-1-8-electric' }}
      columns={{ a: 'Revision 3', b: 'Revision 5' }}
      units={units}
      wide={wide}
    />,
  );
}

describe('CompareView', () => {
  it('on a phone, stacks each changed setting as “before → after” in the viewer’s units', () => {
    renderCompare(BEFORE, AFTER, false);
    expect(screen.getByText('2 settings changed')).toBeTruthy();
    const shocks = byRole('list', 'Shocks: changed settings');
    expect(within(shocks).getByText('Rear shock oil')).toBeTruthy();
    expect(within(shocks).getByText('450 cSt → 500 cSt')).toBeTruthy();
    expect(within(shocks).queryByText('Front shock oil')).toBeNull();
    expect(screen.getByText('27.0 mm → 26.0 mm')).toBeTruthy();
    expect(screen.queryByText('Revision 3')).toBeNull(); // no table headings on a phone
  });

  it('on a wide window, puts both values side by side in a table under the revision names', () => {
    renderCompare(BEFORE, AFTER, true);
    const table = byRole('table', 'Shocks: changed settings');
    expect(within(table).getByText('Revision 3')).toBeTruthy();
    expect(within(table).getByText('Revision 5')).toBeTruthy();
    const row = within(table).getByRole('row', { name: /Rear shock oil/ });
    expect(within(row).getByText('Rear shock oil')).toBeTruthy();
    expect(within(row).getByText('450 cSt')).toBeTruthy();
    expect(within(row).getByText('500 cSt')).toBeTruthy();
    expect(screen.queryByText('450 cSt → 500 cSt')).toBeNull();
  });

  it('folds unchanged settings per section behind “Show N unchanged”', () => {
    renderCompare(BEFORE, AFTER, false);
    expect(screen.queryByText('Front shock oil')).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Show 1 unchanged in Shocks' }));
    expect(screen.getByText('Front shock oil')).toBeTruthy();
    expect(screen.getByText('400 cSt (unchanged)')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Hide 1 unchanged in Shocks' }));
    expect(screen.queryByText('Front shock oil')).toBeNull();
    // A section with nothing changed still says how much it holds.
    expect(screen.getByRole('button', { name: 'Show 2 unchanged in Gearing' })).toBeTruthy();
  });

  it('reads lengths in inches for racers who read inches', () => {
    renderCompare(BEFORE, AFTER, false, IN_F);
    // 27 / 25.4 = 1.063 in; 26 / 25.4 = 1.024 in
    expect(screen.getByText('1.063 in → 1.024 in')).toBeTruthy();
  });

  it('says plainly when nothing changed', () => {
    renderCompare(BEFORE, BEFORE, false);
    expect(screen.getByText('Nothing changed')).toBeTruthy();
    expect(screen.getAllByText('No changes')).toHaveLength(3);
  });

  it('lists settings only one class has apart from the compared ones', () => {
    const comparison = compareSheets(
      { vehicleClass: 'buggy-1-8-nitro', values: { 'gear.spur': 46, 'gear.clutch-bell': 13 } },
      { vehicleClass: 'buggy-1-8-electric', values: { 'gear.spur': 46, 'gear.pinion': 17 } },
    );
    renderThemed(
      <CompareView comparison={comparison} classes={{ a: 'buggy-1-8-nitro', b: 'buggy-1-8-electric' }} columns={{ a: 'Nitro sheet', b: 'Electric sheet' }} units={MM_C} wide={false} />,
    );
    expect(screen.getByText('Only on Nitro sheet')).toBeTruthy();
    expect(within(byRole('list', 'Settings only on Nitro sheet')).getByText('Clutch bell')).toBeTruthy();
    expect(within(byRole('list', 'Settings only on Electric sheet')).getByText('Pinion')).toBeTruthy();
    expect(screen.getByText(/A 1\/8 nitro buggy against a 1\/8 electric buggy/)).toBeTruthy();
  });

  it('compares the computed figures, such as the gear ratio', () => {
    renderCompare(BEFORE, { ...AFTER, 'gear.pinion': 16 }, false);
    const figures = byRole('list', 'Computed figures compared');
    // 46 / 17 = 2.71; 46 / 16 = 2.88
    expect(within(figures).getByText('2.71 : 1 → 2.88 : 1')).toBeTruthy();
  });
});

describe('RevisionChanges', () => {
  it('lists a revision’s changes in sheet order with labels and units, and offers a comment per field', () => {
    const onCommentOnField = jest.fn();
    renderThemed(
      <RevisionChanges
        revisionNumber={5}
        vehicleClass="buggy-1-8-electric"
        units={MM_C}
        changes={[
          { key: 'shock.rear.oil', before: 450, after: 500 },
          { key: 'diff.centre.oil', before: null, after: 7000 },
        ]}
        onCommentOnField={onCommentOnField}
      />,
    );
    const lines = within(byRole('list', 'Changes in revision 5')).getAllByText(/→/);
    // Differentials come before shocks on the sheet.
    expect(lines.map((line) => line.props.children)).toEqual(['Not set → 7000 cSt', '450 cSt → 500 cSt']);
    expect(screen.getByText('Centre diff oil')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Comment on Rear shock oil' }));
    expect(onCommentOnField).toHaveBeenCalledWith({ key: 'shock.rear.oil', label: 'Rear shock oil' });
  });

  it('calls the first revision the starting sheet', () => {
    renderThemed(<RevisionChanges revisionNumber={1} vehicleClass="buggy-1-8-electric" units={MM_C} changes={[]} />);
    expect(screen.getByText('The starting sheet: nothing before it to change.')).toBeTruthy();
  });
});
