import { screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { KitList } from '../../components/KitList';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

describe('KitList', () => {
  const kits = [
    { id: 1, slug: 'a', name: 'Stoat 8N', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-nitro' as const, releasedYear: 2025 },
    { id: 4, slug: 'b', name: 'Wren 10', makerName: 'Marrowby Works', vehicleClass: 'buggy-1-10-4wd' as const, releasedYear: null },
  ];

  it('shows maker, kit name and class label for each kit', () => {
    renderThemed(<KitList kits={kits} />);
    expect(screen.getByText('Ottervale Kitworks Stoat 8N')).toBeTruthy();
    expect(screen.getByText('1/8 nitro buggy · 2025')).toBeTruthy();
    expect(screen.getByText('1/10 4WD buggy')).toBeTruthy();
  });

  it('opens each kit’s page with its public setups', () => {
    renderThemed(<KitList kits={kits} />);
    expect(screen.getByRole('link', { name: 'Ottervale Kitworks Stoat 8N, 1/8 nitro buggy' }).props.href).toBe('/kits/1');
    expect(screen.getByRole('link', { name: 'Marrowby Works Wren 10, 1/10 4WD buggy' }).props.href).toBe('/kits/4');
  });
});
