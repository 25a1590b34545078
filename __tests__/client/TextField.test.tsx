import { fireEvent, screen } from '@testing-library/react-native';
import { PasswordField } from '../../components/PasswordField';
import { TextField } from '../../components/TextField';
import { renderThemed } from './support/render';

describe('TextField', () => {
  it('is reachable by its label and reports typing', () => {
    const onChangeText = jest.fn();
    renderThemed(<TextField label="Home track" value="" onChangeText={onChangeText} />);
    fireEvent.changeText(screen.getByLabelText('Home track'), 'Saltmarsh Raceway');
    expect(onChangeText).toHaveBeenCalledWith('Saltmarsh Raceway');
  });

  it('shows the hint until there is an error, then announces the error instead', () => {
    const { rerender } = renderThemed(<TextField label="Handle" hint="3–30 letters" value="x" onChangeText={() => {}} />);
    expect(screen.getByText('3–30 letters')).toBeTruthy();
    expect(screen.queryByRole('alert')).toBeNull();
    rerender(<TextField label="Handle" hint="3–30 letters" value="x" error="Handles are 3–30 characters." onChangeText={() => {}} />);
    expect(screen.getByRole('alert')).toHaveTextContent('Handles are 3–30 characters.');
    expect(screen.queryByText('3–30 letters')).toBeNull();
  });
});

describe('PasswordField', () => {
  it('hides the password until "Show" is pressed, and hides it again on "Hide"', () => {
    renderThemed(<PasswordField label="Password" purpose="current" value="kiln-night-42" onChangeText={() => {}} />);
    const input = screen.getByLabelText('Password');
    expect(input.props.secureTextEntry).toBe(true);
    fireEvent.press(screen.getByRole('button', { name: 'Show password' }));
    expect(screen.getByLabelText('Password').props.secureTextEntry).toBe(false);
    fireEvent.press(screen.getByRole('button', { name: 'Hide password' }));
    expect(screen.getByLabelText('Password').props.secureTextEntry).toBe(true);
  });

  it('asks password managers for a new password or the saved one, by purpose', () => {
    renderThemed(
      <>
        <PasswordField label="New password" purpose="new" value="" onChangeText={() => {}} />
        <PasswordField label="Current password" purpose="current" value="" onChangeText={() => {}} />
      </>,
    );
    expect(screen.getByLabelText('New password').props.autoComplete).toBe('new-password');
    expect(screen.getByLabelText('Current password').props.autoComplete).toBe('current-password');
  });
});
