import { screen } from '@testing-library/react-native';
import { Avatar, initialsFor } from '../../components/Avatar';
import { renderThemed } from './support/render';

describe('initialsFor', () => {
  it.each([
    ['Maren Holloway', 'MH'],
    ['ada quill-bracken', 'AQ'],
    ['Tamsin de la Rue', 'TR'],
    ['Kestrel', 'K'],
    ['  Oskar   Vell  ', 'OV'],
    ['Émile Østergaard', 'ÉØ'],
    ['(Pit) Crew', 'PC'],
  ])('turns "%s" into "%s"', (name, initials) => {
    expect(initialsFor(name)).toBe(initials);
  });

  it('never splits a character made of two code units', () => {
    expect(initialsFor('𝒜lma Brook')).toBe('𝒜B');
  });

  it('falls back to a question mark when the name has no letters or digits', () => {
    expect(initialsFor('  ')).toBe('?');
    expect(initialsFor('— —')).toBe('?');
  });
});

describe('Avatar', () => {
  it('shows the initials of the display name, hidden from screen readers that read the name beside it', () => {
    renderThemed(<Avatar displayName="Fenna Rooks" size="large" />);
    expect(screen.getByTestId('avatar', { includeHiddenElements: true })).toHaveTextContent('FR');
    expect(screen.queryByText('FR')).toBeNull();
  });
});
