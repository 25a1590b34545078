import { screen } from '@testing-library/react-native';
import { CarCard } from '../../components/CarCard';
import { conditionsFromDraft, EMPTY_CONDITIONS } from '../../components/ConditionsFields';
import { ImportProblems } from '../../components/ImportProblems';
import { ApiRequestError } from '../../hooks/api';
import type { Garage } from '../../shared/types/setups';
import { renderThemed } from './support/render';

// expo-router's navigation runtime does not load under jest; a Link here only wraps its child.
jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

const car: Garage['cars'][number] = {
  id: 7,
  nickname: 'Spare',
  kitId: 2,
  kitName: 'Stoat 8E',
  makerName: 'Ottervale Kitworks',
  vehicleClass: 'buggy-1-8-electric',
  stock: true,
  photoUrl: null,
  createdAt: '2026-11-01T10:00:00.000Z',
  setups: [
    {
      id: 31,
      title: 'Wet night',
      visibility: 'unlisted',
      carId: 7,
      vehicleClass: 'buggy-1-8-electric',
      revisionCount: 3,
      updatedAt: '2026-11-20T18:00:00.000Z',
      conditions: { trackType: 'wet-muddy', temperatureC: 9, grip: 'low' },
    },
  ],
};

describe('CarCard (a car in the garage)', () => {
  it('shows the kit, class, stock badge and each setup with its visibility, track and revision count', () => {
    renderThemed(<CarCard car={car} />);
    expect(screen.getByText('Ottervale Kitworks Stoat 8E · 1/8 electric buggy')).toBeTruthy();
    expect(screen.getByText('Stock, no option parts')).toBeTruthy();
    expect(screen.getByText('Wet night')).toBeTruthy();
    expect(screen.getByText('Unlisted')).toBeTruthy();
    expect(screen.getByText(/^Wet and muddy · 3 revisions · changed /)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'New setup' })).toBeTruthy();
  });

  it('invites a first setup when the car has none', () => {
    renderThemed(<CarCard car={{ ...car, stock: false, setups: [] }} />);
    expect(screen.getByText(/No setups for this car yet/)).toBeTruthy();
    expect(screen.queryByText('Stock, no option parts')).toBeNull();
  });
});

describe('conditionsFromDraft (new setup conditions)', () => {
  it('stores a Fahrenheit temperature in °C to one decimal', () => {
    expect(conditionsFromDraft({ ...EMPTY_CONDITIONS, temperature: '75' }, { length: 'in', temperature: 'F' })).toEqual({
      // (75 − 32) × 5/9 = 23.89
      conditions: { trackType: null, temperatureC: 23.9, grip: null },
    });
  });

  it('refuses temperatures outside the track range, in the racer’s own unit', () => {
    expect(conditionsFromDraft({ ...EMPTY_CONDITIONS, temperature: '150' }, { length: 'mm', temperature: 'F' })).toEqual({
      error: 'Track temperatures go from -22 °F to 140 °F.',
    });
    expect(conditionsFromDraft({ ...EMPTY_CONDITIONS, temperature: 'warm' }, { length: 'mm', temperature: 'C' })).toEqual({
      error: 'Type the temperature as a number, such as 24.',
    });
  });

  it('keeps surface and grip, and leaves "any" unset', () => {
    expect(conditionsFromDraft({ trackType: 'loamy', temperature: '', grip: 'any' }, { length: 'mm', temperature: 'C' })).toEqual({
      conditions: { trackType: 'loamy', temperatureC: null, grip: null },
    });
  });
});

describe('ImportProblems (a refused setup file)', () => {
  it('lists each field the server refused, by its label on the sheet', () => {
    const error = new ApiRequestError(400, 'validation_failed', 'Some values on the sheet need fixing.', {
      'gear.spur': 'Spur gear must be at most 60 teeth.',
      carId: 'That file is for another class of car; pick a car of the same class.',
    });
    renderThemed(<ImportProblems error={error} vehicleClass="buggy-1-8-electric" />);
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent(/Some values on the sheet need fixing\./);
    expect(alert).toHaveTextContent(/Spur gear: Spur gear must be at most 60 teeth\./);
    expect(alert).toHaveTextContent(/Car: That file is for another class of car/);
  });

  it('shows nothing until there is an error', () => {
    renderThemed(<ImportProblems error={null} vehicleClass={null} />);
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
