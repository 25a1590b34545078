import { fireEvent, screen } from '@testing-library/react-native';
import { SetupDetailsForm, type SetupDetailsFormProps } from '../../components/SetupDetailsForm';
import { ApiRequestError } from '../../hooks/api';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({
  router: { dismissTo: () => {} },
  useNavigation: () => ({ addListener: () => () => {}, dispatch: () => {} }),
}));

const saved: SetupDetailsFormProps['saved'] = {
  title: 'Gravel pit — late evening',
  conditions: { trackType: 'loose-dusty', temperatureC: 24, grip: 'low' },
  notesMarkdown: 'Rear oil thinner for the bumps.',
};

function props(overrides: Partial<SetupDetailsFormProps> = {}): SetupDetailsFormProps {
  return {
    setupId: 7,
    saved,
    units: { length: 'mm', temperature: 'C' },
    onSubmit: jest.fn(),
    pending: false,
    error: null,
    preview: { pending: false, error: null },
    onPreview: jest.fn(),
    leaveApproved: { current: false },
    ...overrides,
  };
}

describe('SetupDetailsForm (title, conditions and notes of a setup)', () => {
  it('sends only the fields the racer changed', () => {
    const onSubmit = jest.fn();
    renderThemed(<SetupDetailsForm {...props({ onSubmit })} />);
    fireEvent.changeText(screen.getByLabelText('Notes'), 'Rear oil thinner for the bumps.\n\n- softer front springs');
    fireEvent.press(screen.getByRole('button', { name: 'Save details' }));
    expect(onSubmit).toHaveBeenCalledTimes(1);
    expect(onSubmit).toHaveBeenCalledWith({ notesMarkdown: 'Rear oil thinner for the bumps.\n\n- softer front springs' });
  });

  it('sends nothing when nothing changed, and says so', () => {
    const onSubmit = jest.fn();
    renderThemed(<SetupDetailsForm {...props({ onSubmit })} />);
    fireEvent.press(screen.getByRole('button', { name: 'Save details' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByText('Nothing has changed yet, so there is nothing to save.')).toBeTruthy();
  });

  it('asks the server for a preview and shows the HTML it is given, not the markdown', () => {
    const onPreview = jest.fn();
    const { rerender } = renderThemed(<SetupDetailsForm {...props({ onPreview })} />);
    fireEvent.changeText(screen.getByLabelText('Notes'), 'Keep the **rear** soft.');
    fireEvent.press(screen.getByRole('tab', { name: 'Preview notes' }));
    expect(onPreview).toHaveBeenCalledWith('Keep the **rear** soft.');
    expect(screen.getByText('Rendering the preview…')).toBeTruthy();
    rerender(
      <SetupDetailsForm
        {...props({ onPreview, preview: { markdown: 'Keep the **rear** soft.', html: '<p>Keep the <strong>rear</strong> soft.</p>', pending: false, error: null } })}
      />,
    );
    expect(screen.getByText('Keep the rear soft.')).toBeTruthy();
    expect(screen.queryByText(/\*\*rear\*\*/)).toBeNull();
    expect(screen.queryByLabelText('Notes')).toBeNull();
  });

  it('shows the server’s field error next to its field and keeps what was typed', () => {
    const onSubmit = jest.fn();
    const { rerender } = renderThemed(<SetupDetailsForm {...props({ onSubmit })} />);
    fireEvent.changeText(screen.getByLabelText('Title'), 'Gravel pit — wet');
    fireEvent.press(screen.getByRole('button', { name: 'Save details' }));
    expect(onSubmit).toHaveBeenCalledWith({ title: 'Gravel pit — wet' });
    const error = new ApiRequestError(400, 'validation_failed', 'Some fields need another look.', { title: 'A setup with this title is already in your garage.' });
    rerender(<SetupDetailsForm {...props({ onSubmit, error })} />);
    expect(screen.getByRole('alert')).toHaveTextContent('A setup with this title is already in your garage.');
    expect(screen.getByLabelText('Title')).toHaveDisplayValue('Gravel pit — wet');
  });

  it('counts the notes against the 20,000 character limit', () => {
    renderThemed(<SetupDetailsForm {...props()} />);
    expect(screen.getByText('31 of 20,000 characters')).toBeTruthy();
  });
});
