import { fireEvent, screen } from '@testing-library/react-native';
import { VisibilityChoice } from '../../components/VisibilityChoice';
import { renderThemed } from './support/render';

describe('VisibilityChoice (who can open a setup)', () => {
  it('explains each choice in one line', () => {
    renderThemed(<VisibilityChoice value="private" onChange={() => {}} />);
    expect(screen.getByText('Only you can open it.')).toBeTruthy();
    expect(screen.getByText('Anyone you give the link to can read it; it is listed nowhere.')).toBeTruthy();
    expect(screen.getByText('Every racer can find and read it, signed in or not.')).toBeTruthy();
  });

  it('marks the current choice and reports a new one', () => {
    const onChange = jest.fn();
    renderThemed(<VisibilityChoice value="private" onChange={onChange} />);
    expect(screen.getByRole('radio', { name: /Private/ })).toBeChecked();
    expect(screen.getByRole('radio', { name: /Unlisted, by link/ })).not.toBeChecked();
    fireEvent.press(screen.getByRole('radio', { name: /Unlisted, by link/ }));
    expect(onChange).toHaveBeenCalledWith('unlisted');
  });

  it('does not save again when the current choice is pressed, nor while a save is out', () => {
    const onChange = jest.fn();
    const { rerender } = renderThemed(<VisibilityChoice value="public" onChange={onChange} />);
    fireEvent.press(screen.getByRole('radio', { name: /Public/ }));
    rerender(<VisibilityChoice value="public" onChange={onChange} disabled />);
    fireEvent.press(screen.getByRole('radio', { name: /Private/ }));
    expect(onChange).not.toHaveBeenCalled();
  });
});
