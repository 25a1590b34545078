import { fireEvent, screen, within } from '@testing-library/react-native';
import { Dimensions } from 'react-native';
import { AvailableUpstream, SyncReview } from '../../components/SyncReview';
import { buildUpstreamPayload, changeSyncChoice, SYNC_UNDECIDED } from '../../hooks/forks';
import type { UpstreamRow } from '../../shared/types/forks';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

const MM_C = { length: 'mm', temperature: 'C' } as const;

const rows: UpstreamRow[] = [
  { key: 'gear.spur', label: 'Spur gear', section: 'Gearing', base: 46, theirs: 48, mine: 46, status: 'theirs-only' },
  { key: 'shock.rear.oil', label: 'Rear shock oil', section: 'Shocks', base: 450, theirs: 500, mine: 475, status: 'conflict' },
  { key: 'susp.front.ride-height', label: 'Front ride height', section: 'Suspension', base: 27, theirs: 26, mine: 27, status: 'theirs-only' },
];

const upstream: AvailableUpstream = {
  status: 'available',
  original: { setupId: 7, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick', revisionId: 61, revisionNumber: 6 },
  syncedRevisionNumber: 4,
  mineRevisionId: 90,
  rows,
};

function renderReview(onApply = jest.fn()) {
  renderThemed(<SyncReview upstream={upstream} vehicleClass="buggy-1-8-electric" units={MM_C} onApply={onApply} pending={false} error={null} />);
  return onApply;
}

describe('the sync payload', () => {
  it('lists taken fields and dismissed fields in the order of the rows, and leaves undecided ones out', () => {
    const payload = buildUpstreamPayload(rows, {
      'susp.front.ride-height': { take: true, dismiss: false },
      'gear.spur': { take: false, dismiss: true },
    });
    expect(payload).toEqual({ take: ['susp.front.ride-height'], dismiss: ['gear.spur'] });
    expect(buildUpstreamPayload(rows, {})).toEqual({ take: [], dismiss: [] });
  });

  it('never takes and dismisses the same field', () => {
    const taken = changeSyncChoice(SYNC_UNDECIDED, { take: true });
    const dismissed = changeSyncChoice(taken, { dismiss: true });
    expect(dismissed).toEqual({ take: false, dismiss: true });
    expect(changeSyncChoice(dismissed, { take: true })).toEqual({ take: true, dismiss: false });
    // A choice built by hand with both set still sends the field once, as taken.
    expect(buildUpstreamPayload(rows, { 'gear.spur': { take: true, dismiss: true } })).toEqual({ take: ['gear.spur'], dismiss: [] });
  });
});

describe('reviewing the original’s changes', () => {
  it('shows base, theirs and mine for every field, and applies nothing until asked', () => {
    const onApply = renderReview();
    expect(screen.getByText('The original changed 3 fields since you last took changes')).toBeTruthy();
    const oil = screen.getByLabelText('Rear shock oil');
    expect(within(oil).getByText('When you last took changes (revision 4)')).toBeTruthy();
    expect(within(oil).getByText('450 cSt')).toBeTruthy();
    expect(within(oil).getByText('Original now (revision 6)')).toBeTruthy();
    expect(within(oil).getByText('500 cSt')).toBeTruthy();
    expect(within(oil).getByText('475 cSt')).toBeTruthy();
    expect(screen.getByRole('radio', { name: 'Rear shock oil: keep mine' })).toBeChecked();
    expect(screen.getByRole('button', { name: 'Apply 0 changes' })).toBeDisabled();
    fireEvent.press(screen.getByRole('button', { name: 'Apply 0 changes' }));
    expect(onApply).not.toHaveBeenCalled();
  });

  it('builds take and dismiss from the row choices and says what will happen', () => {
    const onApply = renderReview();
    fireEvent.press(screen.getByRole('checkbox', { name: 'Take the original’s Front ride height' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Rear shock oil: take theirs' }));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Don’t offer Spur gear again' }));
    expect(screen.getByText('• Takes the original’s value for 2 fields: Rear shock oil, Front ride height. Your fork gets a new revision with them.')).toBeTruthy();
    expect(screen.getByText('• Stops offering 1 field until the original changes them again: Spur gear.')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Apply 3 changes' }));
    expect(onApply).toHaveBeenCalledWith({ take: ['shock.rear.oil', 'susp.front.ride-height'], dismiss: ['gear.spur'] });
  });

  it('takes every field only the original changed on "Take all", leaving the conflict as mine', () => {
    const onApply = renderReview();
    fireEvent.press(screen.getByRole('checkbox', { name: 'Don’t offer Spur gear again' }));
    fireEvent.press(screen.getByRole('button', { name: 'Take all 2 that only the original changed' }));
    expect(screen.getByRole('checkbox', { name: 'Take the original’s Spur gear' })).toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'Don’t offer Spur gear again' })).not.toBeChecked();
    expect(screen.getByText('• Keeps your value for 1 field you both changed: Rear shock oil.')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Apply 2 changes' }));
    expect(onApply).toHaveBeenCalledWith({ take: ['gear.spur', 'susp.front.ride-height'], dismiss: [] });
  });

  it('lays the fields out as one table on wide screens', () => {
    const phone = Dimensions.get('window');
    Dimensions.set({ window: { width: 1280, height: 800, scale: 1, fontScale: 1 } });
    try {
      renderReview();
      const table = screen.getByLabelText('Fields the original changed');
      expect(within(table).getByText('Your fork now')).toBeTruthy();
      expect(within(table).getByText('48 teeth')).toBeTruthy();
      expect(screen.queryByLabelText('Spur gear')).toBeNull();
      screen.unmount();
    } finally {
      Dimensions.set({ window: phone });
    }
  });
});
