import { fireEvent, render, screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { HealthBadge } from '../../components/HealthBadge';
import { EmptyState, ErrorState } from '../../components/StatusViews';
import { ThemeProvider } from '../../theme';

function renderThemed(ui: ReactElement) {
  return render(<ThemeProvider>{ui}</ThemeProvider>);
}

describe('HealthBadge', () => {
  it('says the server is being checked, then reachable', () => {
    const { rerender } = renderThemed(<HealthBadge state="checking" />);
    expect(screen.getByText('Checking the server…')).toBeTruthy();
    rerender(
      <ThemeProvider>
        <HealthBadge state="ok" />
      </ThemeProvider>,
    );
    expect(screen.getByText('Server and database reachable')).toBeTruthy();
  });

  it('shows what went wrong when the server is down', () => {
    renderThemed(<HealthBadge state="down" detail="The database is not reachable right now." />);
    expect(screen.getByText(/Server unreachable — The database is not reachable right now\./)).toBeTruthy();
  });
});

describe('ErrorState and EmptyState', () => {
  it('calls onRetry when "Try again" is pressed', () => {
    const onRetry = jest.fn();
    renderThemed(<ErrorState title="Kits could not load" message="Network down" onRetry={onRetry} />);
    fireEvent.press(screen.getByRole('button', { name: 'Try again' }));
    expect(onRetry).toHaveBeenCalledTimes(1);
  });

  it('offers the next action when a list is empty', () => {
    const onAction = jest.fn();
    renderThemed(<EmptyState title="No cars yet" message="Add your first car." actionLabel="Add a car" onAction={onAction} />);
    fireEvent.press(screen.getByRole('button', { name: 'Add a car' }));
    expect(onAction).toHaveBeenCalled();
  });
});
