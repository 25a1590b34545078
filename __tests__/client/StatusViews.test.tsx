import { fireEvent, render, screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { HealthBadge } from '../../components/HealthBadge';
import { KitList } from '../../components/KitList';
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

describe('KitList', () => {
  it('shows maker, kit name and class label for each kit', () => {
    renderThemed(
      <KitList
        kits={[
          { id: 1, slug: 'a', name: 'Stoat 8N', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-nitro', releasedYear: 2025 },
          { id: 2, slug: 'b', name: 'Wren 10', makerName: 'Marrowby Works', vehicleClass: 'buggy-1-10-4wd', releasedYear: null },
        ]}
      />,
    );
    expect(screen.getByText('Ottervale Kitworks Stoat 8N')).toBeTruthy();
    expect(screen.getByText('1/8 nitro buggy · 2025')).toBeTruthy();
    expect(screen.getByText('1/10 4WD buggy')).toBeTruthy();
  });
});
