import { fireEvent, screen } from '@testing-library/react-native';
import { ChangeNoteField } from '../../components/ChangeNoteField';
import { ConflictPanel, type ConflictPanelRow } from '../../components/ConflictPanel';
import { EditorSaveBar } from '../../components/EditorSaveBar';
import { groupPairs } from '../../components/EditorSection';
import { FieldRow, type FieldHandlers, type FieldRowProps } from '../../components/FieldRow';
import { StepperField } from '../../components/StepperField';
import { fieldsByKey, getTemplate } from '../../shared/types/templates';
import { renderThemed } from './support/render';

const template = getTemplate('buggy-1-8-electric');
const field = (key: string) => fieldsByKey(template).get(key)!;

function handlers(): FieldHandlers {
  return { onValue: jest.fn(), onText: jest.fn(), onFinishTyping: jest.fn(), onStep: jest.fn() };
}

function renderField(props: Partial<FieldRowProps> & { field: FieldRowProps['field'] }) {
  const h = props.handlers ?? handlers();
  renderThemed(<FieldRow value={undefined} text="" unitLabel="" {...props} handlers={h} />);
  return h;
}

describe('number fields', () => {
  it('names the stepper buttons after the field and moves it by a step each way', () => {
    const h = renderField({ field: field('shock.front.oil'), value: 600, text: '600', unitLabel: 'cSt' });
    fireEvent.press(screen.getByRole('button', { name: 'Increase front shock oil' }));
    fireEvent.press(screen.getByRole('button', { name: 'Decrease front shock oil' }));
    expect(h.onStep).toHaveBeenNthCalledWith(1, field('shock.front.oil'), 1);
    expect(h.onStep).toHaveBeenNthCalledWith(2, field('shock.front.oil'), -1);
  });

  it('disables + at the top of the range and − at the bottom', () => {
    const oil = field('shock.front.oil');
    if (oil.type !== 'number') throw new Error('shock oil is a number field');
    const { rerender } = renderThemed(
      <FieldRow field={oil} value={oil.max} text={String(oil.max)} unitLabel="cSt" handlers={handlers()} />,
    );
    expect(screen.getByRole('button', { name: 'Increase front shock oil' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Decrease front shock oil' })).toBeEnabled();
    rerender(<FieldRow field={oil} value={oil.min} text={String(oil.min)} unitLabel="cSt" handlers={handlers()} />);
    expect(screen.getByRole('button', { name: 'Decrease front shock oil' })).toBeDisabled();
  });

  it('labels the input with its unit and hands typed text back as typed', () => {
    const h = renderField({ field: field('susp.front.ride-height'), value: 27, text: '1.063', unitLabel: 'in' });
    const input = screen.getByLabelText('Front ride height, in in');
    expect(input.props.value).toBe('1.063');
    fireEvent.changeText(input, '1.1');
    expect(h.onText).toHaveBeenCalledWith(field('susp.front.ride-height'), '1.1');
  });

  it('gives every stepper button at least a 44 px target', () => {
    renderThemed(<StepperField label="Front droop" unitLabel="mm" text="30" onChangeText={jest.fn()} onBlur={jest.fn()} onStep={jest.fn()} canDecrease canIncrease />);
    const style = screen.getByRole('button', { name: 'Increase front droop' }).props.style;
    const flat = Object.assign({}, ...[style].flat(Infinity));
    expect(flat.width).toBeGreaterThanOrEqual(44);
    expect(flat.height).toBeGreaterThanOrEqual(44);
  });
});

describe('field messages', () => {
  it('announces an error under the field and shows a warning that does not block', () => {
    renderField({
      field: field('susp.front.ride-height'),
      value: 45,
      text: '45',
      unitLabel: 'mm',
      error: 'Front ride height must be between 0 mm and 100 mm.',
      warning: 'Unusual for a 1/8 electric buggy: most racers run 20 mm to 40 mm.',
    });
    expect(screen.getByRole('alert')).toHaveTextContent('Front ride height must be between 0 mm and 100 mm.');
    expect(screen.getByText('Unusual for a 1/8 electric buggy: most racers run 20 mm to 40 mm.')).toBeTruthy();
    expect(screen.getAllByRole('alert')).toHaveLength(1);
  });

  it('marks a changed field and says what it was', () => {
    renderField({ field: field('shock.rear.oil'), value: 475, text: '475', unitLabel: 'cSt', previous: '450 cSt' });
    expect(screen.getByText('Changed')).toBeTruthy();
    expect(screen.getByText('was 450 cSt')).toBeTruthy();
  });

  it('shows the template’s help text only when asked', () => {
    const droop = field('susp.front.droop');
    renderField({ field: droop });
    expect(screen.queryByText(droop.help)).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'About front droop' }));
    expect(screen.getByText(droop.help)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'About front droop' })).toBeExpanded();
  });
});

describe('other field types', () => {
  it('shows a choice field’s option labels, not its stored values, and reports the choice', () => {
    const h = renderField({ field: field('shock.front.volume-compensation'), value: 'bladder' });
    expect(screen.getByRole('radio', { name: 'Bladder' })).toBeChecked();
    expect(screen.getByRole('radio', { name: 'Emulsion (oil and air mixed)' })).not.toBeChecked();
    fireEvent.press(screen.getByRole('radio', { name: 'Membrane' }));
    expect(h.onValue).toHaveBeenCalledWith('shock.front.volume-compensation', 'membrane');
  });

  it('offers one numbered button per hole on a position field', () => {
    const tower = field('shock.front.tower-hole');
    if (tower.type !== 'position') throw new Error('tower hole is a position field');
    const h = renderField({ field: tower, value: 2 });
    expect(screen.getAllByRole('radio')).toHaveLength(tower.max - tower.min + 1);
    expect(screen.getByRole('radio', { name: 'Hole 2' })).toBeChecked();
    fireEvent.press(screen.getByRole('radio', { name: 'Hole 3' }));
    expect(h.onValue).toHaveBeenCalledWith('shock.front.tower-hole', 3);
  });

  it('turns a yes/no field on with its switch', () => {
    const h = renderField({ field: field('chassis.stiffener'), value: false });
    fireEvent(screen.getByRole('switch', { name: 'Chassis stiffeners fitted' }), 'valueChange', true);
    expect(h.onValue).toHaveBeenCalledWith('chassis.stiffener', true);
  });

  it('limits a text field to the template’s length', () => {
    renderField({ field: field('shock.front.spring-label'), value: 'blue' });
    expect(screen.getByLabelText('Front spring marking').props.maxLength).toBe(40);
    expect(screen.getByText('4 of 40 characters')).toBeTruthy();
  });

  it('puts front and rear halves of a setting in one row', () => {
    const shocks = template.sections.find((s) => s.key === 'shocks')!;
    const rows = groupPairs(shocks.fields);
    expect(rows[0].map((f) => f.key)).toEqual(['shock.front.oil', 'shock.rear.oil']);
    expect(rows.every((row) => row.length === 2)).toBe(true);
  });
});

describe('save bar', () => {
  const bar = (changedCount: number, extra: Partial<Parameters<typeof EditorSaveBar>[0]> = {}) => (
    <EditorSaveBar changedCount={changedCount} problemCount={0} nextRevisionNumber={5} saving={false} conflictOpen={false} onSave={jest.fn()} {...extra} />
  );

  it('counts the changed fields and only offers Save once something changed', () => {
    const { rerender } = renderThemed(bar(0));
    expect(screen.getByText('No fields changed yet')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Save revision 5' })).toBeDisabled();
    rerender(bar(1));
    expect(screen.getByText('1 field changed')).toBeTruthy();
    rerender(bar(3));
    expect(screen.getByText('3 fields changed')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Save revision 5' })).toBeEnabled();
  });

  it('shows progress while saving and says what blocks the save', () => {
    const { rerender } = renderThemed(bar(2, { saving: true }));
    expect(screen.getByRole('button', { name: 'Saving…' })).toBeDisabled();
    rerender(bar(2, { problemCount: 2 }));
    expect(screen.getByText('2 values need fixing before you can save.')).toBeTruthy();
  });
});

describe('change note', () => {
  it('says it is required and keeps Enter as a new line rather than a submit', () => {
    renderThemed(<ChangeNoteField value="" onChangeText={jest.fn()} required error="Say what changed and why." />);
    const input = screen.getByLabelText('Change note (required)');
    expect(input.props.multiline).toBe(true);
    expect(input.props.submitBehavior).toBe('newline');
    expect(screen.getByRole('alert')).toHaveTextContent('Say what changed and why.');
  });
});

describe('conflict panel', () => {
  const rows: ConflictPanelRow[] = [
    { key: 'shock.rear.oil', label: 'Rear shock oil', mine: '500 cSt', theirs: '400 cSt', editedByMe: true, editedByThem: true, choice: 'mine' },
    { key: 'diff.centre.oil', label: 'Centre diff oil', mine: '7000 cSt', theirs: '8000 cSt', editedByMe: false, editedByThem: true, choice: 'theirs' },
  ];

  it('lists both values per field with the racer’s choice, and reports a change of mind', () => {
    const onChoose = jest.fn();
    renderThemed(
      <ConflictPanel revisionNumber={5} authorHandle="juno_braithwick" savedAt="2026-11-30T18:00:00.000Z" changeNote="Thicker centre diff." rows={rows} onChoose={onChoose} onApply={jest.fn()} />,
    );
    expect(screen.getByText('Yours: 500 cSt')).toBeTruthy();
    expect(screen.getByText('In revision 5: 400 cSt')).toBeTruthy();
    expect(screen.getByText('Yours: 7000 cSt (you did not change this)')).toBeTruthy();
    const [mineFirst] = screen.getAllByRole('radio', { name: 'Keep mine' });
    expect(mineFirst).toBeChecked();
    fireEvent.press(screen.getAllByRole('radio', { name: 'Take theirs' })[0]);
    expect(onChoose).toHaveBeenCalledWith('shock.rear.oil', 'theirs');
  });
});
