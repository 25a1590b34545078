import { fireEvent, screen, within } from '@testing-library/react-native';
import { ForkPreviewPanel } from '../../components/ForkPreviewPanel';
import { allStockChoices, defaultStockChoices } from '../../hooks/forks';
import type { ForkPreview } from '../../shared/types/forks';
import { renderThemed } from './support/render';

const MM_C = { length: 'mm', temperature: 'C' } as const;
const IN_F = { length: 'in', temperature: 'F' } as const;

function preview(stock: boolean, overrides: Partial<ForkPreview> = {}): ForkPreview {
  return {
    source: {
      setupId: 7, revisionId: 44, revisionNumber: 4, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick',
      vehicleClass: 'buggy-1-8-electric', kitName: 'Stoat 8E',
    },
    target: { carId: 12, nickname: 'First Stoat', kitName: 'Stoat 8E', vehicleClass: 'buggy-1-8-electric', stock },
    checkedOptionParts: true,
    optionParts: [
      { key: 'chassis.centre-brace', label: 'Centre chassis brace', section: 'Chassis', value: 'stiff', stockValue: 'standard' },
      { key: 'susp.front.arm-stiffness', label: 'Front arm stiffness', section: 'Suspension', value: 'hard', stockValue: 'medium' },
      { key: 'shock.rear.volume-compensation', label: 'Rear bladder, membrane or emulsion', section: 'Shocks', value: 'membrane', stockValue: 'bladder' },
    ],
    dropped: [],
    filledFromStock: [],
    ...overrides,
  };
}

const keepRadio = (label: string) => screen.getByRole('radio', { name: new RegExp(`^${label}: keep the original`) });
const stockRadio = (label: string) => screen.getByRole('radio', { name: new RegExp(`^${label}: take the stock`) });

function renderPanel(p: ForkPreview, onConfirm = jest.fn(), units: typeof MM_C | typeof IN_F = MM_C) {
  renderThemed(<ForkPreviewPanel preview={p} units={units} onConfirm={onConfirm} pending={false} error={null} />);
  return onConfirm;
}

describe('default option-part choices', () => {
  const parts = preview(true).optionParts;

  it('take the stock value on a car marked stock, since it has none of the parts', () => {
    expect(defaultStockChoices(parts, true)).toEqual({
      'chassis.centre-brace': 'stock', 'susp.front.arm-stiffness': 'stock', 'shock.rear.volume-compensation': 'stock',
    });
  });

  it('keep the original’s value on a car not marked stock', () => {
    expect(defaultStockChoices(parts, false)).toEqual({
      'chassis.centre-brace': 'keep', 'susp.front.arm-stiffness': 'keep', 'shock.rear.volume-compensation': 'keep',
    });
  });

  it('set one choice for every part on "all"', () => {
    expect(Object.values(allStockChoices(parts, 'keep'))).toEqual(['keep', 'keep', 'keep']);
    expect(Object.values(allStockChoices(parts, 'stock'))).toEqual(['stock', 'stock', 'stock']);
  });
});

describe('the option-part chooser', () => {
  it('shows each part with the original’s and the stock value, starting on stock for a stock car', () => {
    renderPanel(preview(true));
    const row = screen.getByLabelText('Centre chassis brace');
    expect(within(row).getByText('Original: Stiff')).toBeTruthy();
    expect(within(row).getByText('Your kit’s stock: Standard')).toBeTruthy();
    expect(stockRadio('Centre chassis brace')).toBeChecked();
    expect(keepRadio('Centre chassis brace')).not.toBeChecked();
    expect(stockRadio('Front arm stiffness')).toBeChecked();
    expect(screen.getByText('Keeping 0 of 3 · taking stock for 3')).toBeTruthy();
  });

  it('starts on the original’s values for a car not marked stock', () => {
    renderPanel(preview(false));
    expect(keepRadio('Centre chassis brace')).toBeChecked();
    expect(keepRadio('Rear bladder, membrane or emulsion')).toBeChecked();
    expect(screen.getByText('Keeping 3 of 3 · taking stock for 0')).toBeTruthy();
  });

  it('sends the mix the racer chose, after "Take all stock values" and "Keep all"', () => {
    const onConfirm = renderPanel(preview(false));
    fireEvent.press(screen.getByRole('button', { name: 'Take all stock values' }));
    expect(stockRadio('Centre chassis brace')).toBeChecked();
    expect(stockRadio('Front arm stiffness')).toBeChecked();
    fireEvent.press(keepRadio('Front arm stiffness'));
    fireEvent.press(screen.getByRole('button', { name: 'Start from this setup' }));
    expect(onConfirm).toHaveBeenLastCalledWith({
      'chassis.centre-brace': 'stock', 'susp.front.arm-stiffness': 'keep', 'shock.rear.volume-compensation': 'stock',
    });
    fireEvent.press(screen.getByRole('button', { name: 'Keep all' }));
    fireEvent.press(screen.getByRole('button', { name: 'Start from this setup' }));
    expect(onConfirm).toHaveBeenLastCalledWith({
      'chassis.centre-brace': 'keep', 'susp.front.arm-stiffness': 'keep', 'shock.rear.volume-compensation': 'keep',
    });
  });

  it('says there is nothing to buy when the check found no option parts', () => {
    renderPanel(preview(true, { optionParts: [] }));
    expect(screen.getByText(/Everything this setup uses comes in your kit’s box/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Keep all' })).toBeNull();
  });
});

describe('fields filled from stock and dropped', () => {
  it('shows filled values in the viewer’s units', () => {
    const filledFromStock = [{ key: 'susp.front.ride-height', label: 'Front ride height', section: 'Suspension', value: null, stockValue: 27 }];
    renderPanel(preview(true, { filledFromStock }), jest.fn(), IN_F);
    const list = screen.getByLabelText('Filled from your kit’s stock sheet');
    // 1 in = 25.4 mm exactly (international inch, 1959): 27 / 25.4 = 1.0630
    expect(within(list).getByText('Suspension · stock 1.063 in')).toBeTruthy();
  });

  it('folds a long list of dropped fields to its first five rows until asked', () => {
    const dropped = Array.from({ length: 7 }, (_, i) => ({ key: `nitro.field-${i}`, label: `Engine setting ${i + 1}`, section: 'Engine', value: i }));
    renderPanel(preview(true, { dropped }));
    const title = 'Dropped (your class’s sheet has no such field)';
    expect(screen.getAllByText(/^Engine setting \d$/)).toHaveLength(5);
    fireEvent.press(screen.getByRole('button', { name: `Show all 7: ${title}` }));
    expect(screen.getAllByText(/^Engine setting \d$/)).toHaveLength(7);
    expect(screen.getByText('Engine · the original has 6')).toBeTruthy();
  });
});
