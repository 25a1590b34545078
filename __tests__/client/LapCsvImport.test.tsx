import { fireEvent, screen, within } from '@testing-library/react-native';
import { LapCsvImport } from '../../components/LapCsvImport';
import { renderThemed } from './support/render';

function paste(text: string) {
  fireEvent.changeText(screen.getByLabelText('Or paste the rows'), text);
  fireEvent.press(screen.getByRole('button', { name: 'Read the pasted rows' }));
}

describe('lap CSV import (preview before anything is used)', () => {
  it('shows the documented file shape where the file is picked', () => {
    renderThemed(<LapCsvImport onUse={() => {}} />);
    expect(screen.getByText('The lap file Tunefork reads')).toBeTruthy();
    expect(screen.getByText(/A CSV file with a lap column and a time column/)).toBeTruthy();
    expect(screen.getByText(/^lap,time 1,32\.481 2,31\.907 3,1:02\.345$/)).toBeTruthy();
  });

  it('previews the laps read and names every bad row by its line in the file', () => {
    const onUse = jest.fn();
    renderThemed(<LapCsvImport onUse={onUse} />);
    paste(['lap,time', '1,32.481', '2,abc', '', '3,1:02.345', '3,31.900', 'x,30.1'].join('\n'));
    expect(screen.getByText('2 laps read from the pasted rows, with a header row, columns split by commas.')).toBeTruthy();
    const laps = screen.getByLabelText('Laps read');
    expect(within(laps).getByText('Lap 1: 32.481')).toBeTruthy();
    expect(within(laps).getByText('Lap 3: 1:02.345')).toBeTruthy();
    expect(screen.getByText('3 rows could not be read and will be left out:')).toBeTruthy();
    expect(screen.getByText(/^• Row 3: time 'abc' is not a lap time/)).toBeTruthy();
    expect(screen.getByText('• Row 6: lap 3 appears twice (also row 5)')).toBeTruthy();
    expect(screen.getByText("• Row 7: lap 'x' is not a whole lap number")).toBeTruthy();
    expect(screen.getByText(/Lap numbers missing from the file: 2\./)).toBeTruthy();
    expect(onUse).not.toHaveBeenCalled();
    fireEvent.press(screen.getByRole('button', { name: 'Use these 2 laps' }));
    expect(onUse).toHaveBeenCalledWith([32.481, 62.345]);
    // Once used, the preview closes.
    expect(screen.queryByText(/laps read from/)).toBeNull();
  });

  it('reads a file without a header, split by semicolons with decimal commas, in lap-number order', () => {
    const onUse = jest.fn();
    renderThemed(<LapCsvImport onUse={onUse} />);
    paste('2;31,950\n1;32,481\n');
    expect(screen.getByText('2 laps read from the pasted rows, without a header row, columns split by semicolons.')).toBeTruthy();
    expect(screen.queryByText(/could not be read/)).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Use these 2 laps' }));
    expect(onUse).toHaveBeenCalledWith([32.481, 31.95]);
  });

  it('refuses a file larger than 200 KB with a clear message and keeps nothing from it', () => {
    const onUse = jest.fn();
    renderThemed(<LapCsvImport onUse={onUse} />);
    paste(`lap,time\n${'1,32.481\n'.repeat(25_000)}`);
    expect(screen.getByText('The lap file is larger than 200 KB: split it into smaller files.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Use these/ })).toBeNull();
  });

  it('says so when the rows hold a header but no laps, and offers nothing to use', () => {
    renderThemed(<LapCsvImport onUse={() => {}} />);
    paste('lap,time\n');
    expect(screen.getByText('The lap file has a header but no lap rows.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Use these/ })).toBeNull();
  });

  it('echoes control and direction characters from a naughty file as visible codes', () => {
    renderThemed(<LapCsvImport onUse={() => {}} />);
    paste('lap,time\n1,32.4\u202e81\n');
    expect(screen.getByText(/Row 2: time '32\.4\\u202e81' is not a lap time/i)).toBeTruthy();
  });
});
