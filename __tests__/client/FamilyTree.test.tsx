import { screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { FamilyTree } from '../../components/FamilyTree';
import { familyTreeOrder, type Family, type FamilyNode } from '../../hooks/forks';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

function node(id: number, parentId: number, depth: number, extra: Partial<FamilyNode> = {}): FamilyNode {
  return {
    id, parentId, depth, visible: true, title: `Setup ${id}`, ownerHandle: 'pell-strand',
    createdAt: `2026-11-${String(id).padStart(2, '0')}T10:00:00.000Z`, changedFromParent: id % 3, ...extra,
  };
}

// The API lists forks by depth, then age (breadth first).
const descendants = [node(10, 7, 1), node(11, 7, 1), node(12, 10, 2), node(13, 11, 2), node(14, 12, 3)];

describe('the order of a family tree', () => {
  // Depth-first, each fork before its own forks: how trees are usually printed (common practice, no source).
  it('puts every fork right under the setup it came from, oldest first', () => {
    expect(familyTreeOrder(7, descendants).map((n) => n.id)).toEqual([10, 12, 14, 11, 13]);
  });

  it('keeps forks whose parent is missing from the list instead of losing them', () => {
    expect(familyTreeOrder(7, [node(20, 99, 2), ...descendants]).map((n) => n.id)).toEqual([10, 12, 14, 11, 13, 20]);
  });

  it('walks a chain a thousand forks deep without running out of stack', () => {
    const chain = Array.from({ length: 1000 }, (_, i) => node(100 + i, i === 0 ? 7 : 99 + i, i + 1));
    expect(familyTreeOrder(7, chain)).toHaveLength(1000);
  });
});

describe('the family view', () => {
  const family: Family = {
    ancestors: [node(1, 0, -2, { parentId: null, changedFromParent: null, title: 'Saltmarsh base' }), node(4, 1, -1, { visible: false, title: null, ownerHandle: null })],
    descendants: [node(10, 7, 1, { changedFromParent: 3 }), node(12, 10, 2, { visible: false, title: null, ownerHandle: null, changedFromParent: 1 })],
    forkCount: 1,
    familyForkCount: 4,
  };
  const self = { id: 7, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick', createdAt: '2026-11-07T10:00:00.000Z' };

  it('shows the counts, the chain up to the first setup and the forks with their changes', () => {
    renderThemed(<FamilyTree family={family} self={self} forkHref="/setups/7/fork" />);
    expect(screen.getByText('1 fork of this setup · 4 forks in the whole family')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Saltmarsh base by @pell-strand' }).props.href).toBe('/setups/1');
    expect(screen.getByText(/This setup · @juno_braithwick/)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Setup 10 by @pell-strand' }).props.href).toBe('/setups/10');
    expect(screen.getByText(/3 fields changed from its parent/)).toBeTruthy();
  });

  it('keeps setups the viewer may not open in the tree as "Not shared", without a link', () => {
    renderThemed(<FamilyTree family={family} self={self} forkHref="/setups/7/fork" />);
    expect(screen.getAllByText('Not shared')).toHaveLength(2);
    expect(screen.getAllByText(/1 field changed from its parent/)).toHaveLength(2);
    expect(screen.getAllByRole('link').map((l) => l.props.href)).toEqual(['/setups/1', '/setups/10']);
  });

  it('offers to start from the setup when it has no forks yet', () => {
    renderThemed(<FamilyTree family={{ ancestors: [], descendants: [], forkCount: 0, familyForkCount: 0 }} self={self} forkHref="/setups/7/fork" />);
    expect(screen.getByText(/No forks yet/)).toBeTruthy();
    expect(screen.getByText('It is the first setup of its family.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Start from this setup' }).props.href).toBe('/setups/7/fork');
  });
});
