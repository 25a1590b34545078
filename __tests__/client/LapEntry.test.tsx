import { fireEvent, screen } from '@testing-library/react-native';
import { useState } from 'react';
import { LapEntry } from '../../components/LapEntry';
import { renderThemed } from './support/render';

/** The lap entry as a form holds it: the laps live in the parent's state. */
function Harness({ initial = [], onLaps }: { initial?: number[]; onLaps?: (laps: number[]) => void }) {
  const [laps, setLaps] = useState<number[]>(initial);
  return (
    <LapEntry
      laps={laps}
      onChange={(next) => {
        setLaps(next);
        onLaps?.(next);
      }}
    />
  );
}

function typeAndEnter(text: string) {
  const field = screen.getByLabelText('Lap time');
  fireEvent.changeText(field, text);
  fireEvent(field, 'submitEditing', { nativeEvent: { text } });
}

describe('lap entry (one field, Enter adds the lap)', () => {
  it('adds a lap on Enter and empties the field for the next one', () => {
    const onLaps = jest.fn();
    renderThemed(<Harness onLaps={onLaps} />);
    typeAndEnter('38.412');
    expect(onLaps).toHaveBeenLastCalledWith([38.412]);
    expect(screen.getByLabelText('Lap time').props.value).toBe('');
    typeAndEnter('37.9');
    expect(onLaps).toHaveBeenLastCalledWith([38.412, 37.9]);
    expect(screen.getByText('Lap 1')).toBeTruthy();
    expect(screen.getByText('Lap 2')).toBeTruthy();
    // The faster lap is marked as the best so far.
    expect(screen.getByText('37.900 (best)')).toBeTruthy();
    expect(screen.getByText('Lap 2: 37.900 added.')).toBeTruthy();
  });

  it('reads minutes and seconds, 1:02.345 being 62.345 s', () => {
    const onLaps = jest.fn();
    renderThemed(<Harness onLaps={onLaps} />);
    typeAndEnter('1:02.345');
    expect(onLaps).toHaveBeenLastCalledWith([62.345]);
    expect(screen.getByText('1:02.345 (best)')).toBeTruthy();
  });

  it('keeps bad input in the field and says what a lap time looks like', () => {
    const onLaps = jest.fn();
    renderThemed(<Harness onLaps={onLaps} />);
    typeAndEnter('38,4x');
    expect(onLaps).not.toHaveBeenCalled();
    expect(screen.getByText('“38,4x” is not a lap time (write seconds like 32.481 or minutes like 1:02.345).')).toBeTruthy();
    expect(screen.getByLabelText('Lap time').props.value).toBe('38,4x');
    typeAndEnter('1:75.000');
    expect(screen.getByText(/“1:75.000” is not a lap time/)).toBeTruthy();
    // Fixing the text clears the message.
    fireEvent.changeText(screen.getByLabelText('Lap time'), '38.4');
    expect(screen.queryByText(/is not a lap time/)).toBeNull();
  });

  it('ignores Enter on an empty field, so a double press adds nothing', () => {
    const onLaps = jest.fn();
    renderThemed(<Harness onLaps={onLaps} />);
    typeAndEnter('   ');
    expect(onLaps).not.toHaveBeenCalled();
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('adds with the "Add lap" button too, and removes a lap with its own button', () => {
    const onLaps = jest.fn();
    renderThemed(<Harness initial={[32.1, 45.9, 32.4]} onLaps={onLaps} />);
    fireEvent.changeText(screen.getByLabelText('Lap time'), '32.2');
    fireEvent.press(screen.getByRole('button', { name: 'Add lap' }));
    expect(onLaps).toHaveBeenLastCalledWith([32.1, 45.9, 32.4, 32.2]);
    fireEvent.press(screen.getByRole('button', { name: 'Remove lap 2, 45.900' }));
    expect(onLaps).toHaveBeenLastCalledWith([32.1, 32.4, 32.2]);
  });
});
