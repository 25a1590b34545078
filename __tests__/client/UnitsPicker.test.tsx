import { fireEvent, screen } from '@testing-library/react-native';
import { UnitsPicker } from '../../components/UnitsPicker';
import { renderThemed } from './support/render';

describe('UnitsPicker (settings units choice)', () => {
  it('marks the saved units as chosen', () => {
    renderThemed(<UnitsPicker value={{ length: 'mm', temperature: 'F' }} onChange={() => {}} />);
    expect(screen.getByRole('radio', { name: 'Millimetres' })).toBeChecked();
    expect(screen.getByRole('radio', { name: 'Inches' })).not.toBeChecked();
    expect(screen.getByRole('radio', { name: 'Degrees Fahrenheit' })).toBeChecked();
    expect(screen.getByRole('radio', { name: 'Degrees Celsius' })).not.toBeChecked();
  });

  it('switches lengths to inches and keeps the temperature unit', () => {
    const onChange = jest.fn();
    renderThemed(<UnitsPicker value={{ length: 'mm', temperature: 'C' }} onChange={onChange} />);
    fireEvent.press(screen.getByRole('radio', { name: 'Inches' }));
    expect(onChange).toHaveBeenCalledWith({ length: 'in', temperature: 'C' });
  });

  it('switches temperatures to °F and keeps the length unit', () => {
    const onChange = jest.fn();
    renderThemed(<UnitsPicker value={{ length: 'in', temperature: 'C' }} onChange={onChange} />);
    fireEvent.press(screen.getByRole('radio', { name: 'Degrees Fahrenheit' }));
    expect(onChange).toHaveBeenCalledWith({ length: 'in', temperature: 'F' });
  });

  it('does not save again when the chosen unit is pressed', () => {
    const onChange = jest.fn();
    renderThemed(<UnitsPicker value={{ length: 'mm', temperature: 'C' }} onChange={onChange} />);
    fireEvent.press(screen.getByRole('radio', { name: 'Millimetres' }));
    expect(onChange).not.toHaveBeenCalled();
  });

  it('ignores presses while a save is under way', () => {
    const onChange = jest.fn();
    renderThemed(<UnitsPicker value={{ length: 'mm', temperature: 'C' }} onChange={onChange} disabled />);
    fireEvent.press(screen.getByRole('radio', { name: 'Inches' }));
    expect(onChange).not.toHaveBeenCalled();
  });
});
