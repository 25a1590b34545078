import { fireEvent, screen, within } from '@testing-library/react-native';
import { SetupSheet } from '../../components/SetupSheet';
import { SetupSheetSection } from '../../components/SetupSheetSection';
import { getTemplate } from '../../shared/types/templates';
import { renderThemed } from './support/render';

const template = getTemplate('buggy-1-8-electric');
const section = (key: string) => {
  const found = template.sections.find((s) => s.key === key);
  if (!found) throw new Error(`no section ${key}`);
  return found;
};

const MM_C = { length: 'mm', temperature: 'C' } as const;
const IN_F = { length: 'in', temperature: 'F' } as const;

function renderSection(key: string, values: Record<string, number | string | boolean>, units: typeof MM_C | typeof IN_F) {
  return renderThemed(<SetupSheetSection section={section(key)} values={values} units={units} open onToggle={() => {}} />);
}

describe('SetupSheetSection value formatting', () => {
  const suspension = { 'susp.front.ride-height': 27, 'susp.rear.ride-height': 29, 'susp.front.camber': -1.5, 'susp.front.camber-link-inner': 4 };

  it('shows lengths in millimetres to one decimal for millimetre readers', () => {
    renderSection('suspension', suspension, MM_C);
    const row = screen.getByRole('row', { name: /Ride height/ });
    expect(within(row).getByText('27.0 mm')).toBeTruthy();
    expect(within(row).getByText('29.0 mm')).toBeTruthy();
  });

  it('shows the same lengths in inches to three decimals for inch readers, and leaves angles alone', () => {
    renderSection('suspension', suspension, IN_F);
    // 27 / 25.4 = 1.0630; 29 / 25.4 = 1.1417
    expect(screen.getByText('1.063 in')).toBeTruthy();
    expect(screen.getByText('1.142 in')).toBeTruthy();
    expect(screen.getByText('-1.5°')).toBeTruthy();
    expect(screen.getByText('Hole 4')).toBeTruthy();
  });

  it('shows temperatures in °C or °F by preference and other units as stored', () => {
    const values = { 'motor.max-temp': 55, 'motor.kv': 2000, 'battery.voltage': 14.8 };
    const celsius = renderSection('motor', values, MM_C);
    expect(screen.getByText('55 °C')).toBeTruthy();
    expect(screen.getByText('2000 kV')).toBeTruthy();
    expect(screen.getByText('14.8 V')).toBeTruthy();
    celsius.unmount();
    renderSection('motor', values, IN_F);
    // 55 × 9/5 + 32 = 131
    expect(screen.getByText('131 °F')).toBeTruthy();
    expect(screen.getByText('2000 kV')).toBeTruthy();
  });

  it('shows choices by their label, yes/no for switches, and a dash for empty fields', () => {
    renderSection('chassis', { 'chassis.stiffener': false, 'chassis.weight': 3100, 'chassis.ballast-position': 'front' }, MM_C);
    expect(screen.getByText('No')).toBeTruthy();
    expect(screen.getByText('3100 g')).toBeTruthy();
    expect(screen.getByText('Front')).toBeTruthy();
    expect(screen.getAllByLabelText('Not set').length).toBeGreaterThan(0);
  });

  it('puts front and rear of a pair in one row under Front and Rear headings', () => {
    renderSection('suspension', suspension, MM_C);
    const header = screen.getAllByRole('row')[0];
    expect(within(header).getByText('Setting')).toBeTruthy();
    expect(within(header).getByText('Front')).toBeTruthy();
    expect(within(header).getByText('Rear')).toBeTruthy();
    const row = screen.getByRole('row', { name: /Ride height/ });
    expect(within(row).getByText('27.0 mm')).toBeTruthy();
    expect(screen.queryByText('Front ride height')).toBeNull();
  });
});

describe('SetupSheet sections', () => {
  it('opens only the first section on phones, and a section on pressing its heading', () => {
    renderThemed(<SetupSheet vehicleClass="buggy-1-8-electric" values={{}} units={MM_C} openAll={false} />);
    const toggles = screen.getAllByRole('button', { expanded: false });
    expect(screen.getByRole('button', { name: /Differentials/ })).toBeExpanded();
    expect(toggles.length).toBe(template.sections.length - 1);
    fireEvent.press(screen.getByRole('button', { name: /Gearing/ }));
    expect(screen.getByRole('button', { name: /Gearing/ })).toBeExpanded();
    expect(screen.getByText('Spur gear')).toBeTruthy();
  });

  it('opens every section at once on wide screens', () => {
    renderThemed(<SetupSheet vehicleClass="buggy-1-8-electric" values={{}} units={MM_C} openAll />);
    expect(screen.queryAllByRole('button', { expanded: false })).toHaveLength(0);
  });
});
