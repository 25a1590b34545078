import { screen } from '@testing-library/react-native';
import { SummaryCard } from '../../components/SummaryCard';
import { renderThemed } from './support/render';

const MM_C = { length: 'mm', temperature: 'C' } as const;
const IN_F = { length: 'in', temperature: 'F' } as const;

// A 1/8 electric buggy sheet: 46/17 spur and pinion, 43/10 diffs, 110 mm rear tires, 2000 kV on 14.8 V.
const ELECTRIC_SHEET = {
  'gear.spur': 46,
  'gear.pinion': 17,
  'gear.diff-ring': 43,
  'gear.diff-pinion': 10,
  'tire.rear.diameter': 110,
  'susp.rear.toe-block-fore': -1,
  'susp.rear.toe-block-aft': 3.5,
  'susp.rear.hub-toe': 1.5,
  'motor.kv': 2000,
  'battery.voltage': 14.8,
};

describe('SummaryCard (computed figures of a setup)', () => {
  it('shows ratios, rollout, total toe and top speed worked out from the sheet', () => {
    renderThemed(<SummaryCard vehicleClass="buggy-1-8-electric" values={ELECTRIC_SHEET} units={MM_C} />);
    // 46 / 17 = 2.706; 43 / 10 = 4.3; 2.706 × 4.3 = 11.635
    expect(screen.getByText('2.71 : 1')).toBeTruthy();
    expect(screen.getByText('4.30 : 1')).toBeTruthy();
    expect(screen.getByText('11.64 : 1')).toBeTruthy();
    // π × 110 mm / 11.635 = 29.70 mm per motor turn
    expect(screen.getByText('29.7 mm')).toBeTruthy();
    // toe blocks 3.5° − (−1°) … plus 1.5° at the hub, per shared/compute/setup/toe.ts
    expect(screen.getByText('Total rear toe')).toBeTruthy();
    // 2000 kV × 14.8 V = 29,600 rpm × 29.70 mm = 52.7 km/h
    expect(screen.getByText('53 km/h')).toBeTruthy();
    expect(screen.queryByText(/Fill in/)).toBeNull();
  });

  it('gives rollout in inches and top speed in mph to racers who read inches', () => {
    renderThemed(<SummaryCard vehicleClass="buggy-1-8-electric" values={ELECTRIC_SHEET} units={IN_F} />);
    // 29.70 mm / 25.4 = 1.169 in; 52.7 km/h / 1.609 = 33 mph
    expect(screen.getByText('1.169 in')).toBeTruthy();
    expect(screen.getByText('33 mph')).toBeTruthy();
  });

  it('names the fields to fill in when a figure cannot be worked out yet', () => {
    const { 'gear.pinion': _pinion, 'tire.rear.diameter': _tire, ...rest } = ELECTRIC_SHEET;
    renderThemed(<SummaryCard vehicleClass="buggy-1-8-electric" values={rest} units={MM_C} />);
    expect(screen.getAllByText('Fill in Pinion to see this.')).toHaveLength(2); // gear ratio and final drive
    expect(screen.getAllByText('Fill in Pinion and Rear tire diameter to see this.')).toHaveLength(2); // rollout and top speed
    expect(screen.getByText('4.30 : 1')).toBeTruthy();
  });

  it('asks nitro racers for the clutch bell and shows no electric top speed', () => {
    renderThemed(<SummaryCard vehicleClass="buggy-1-8-nitro" values={{ 'gear.spur': 46 }} units={MM_C} />);
    expect(screen.getAllByText('Fill in Clutch bell to see this.').length).toBeGreaterThan(0);
    expect(screen.queryByText('Top speed with no load')).toBeNull();
  });

  it('leaves out, and says so, the figures a 2WD sheet has no fields for', () => {
    renderThemed(<SummaryCard vehicleClass="buggy-1-10-2wd" values={{ 'gear.spur': 87, 'gear.pinion': 29 }} units={MM_C} />);
    expect(screen.getByText('3.00 : 1')).toBeTruthy();
    expect(screen.queryByText('Final drive')).toBeNull();
    expect(screen.queryByText(/Diff ring gear/)).toBeNull();
    expect(screen.getByText(/Not worked out for this class.*final drive/)).toBeTruthy();
  });
});
