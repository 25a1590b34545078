import { screen } from '@testing-library/react-native';
import { SafetyNote } from '../../components/SafetyNote';
import { renderThemed } from './support/render';

describe('SafetyNote (cautions beside a setup)', () => {
  it('warns about nitro fuel and hot engines on a nitro car, not about battery packs', () => {
    renderThemed(<SafetyNote vehicleClass="truggy-1-8-nitro" />);
    expect(screen.getByText(/Nitro fuel is toxic and catches fire easily/)).toBeTruthy();
    expect(screen.getByText(/Glow igniters, engines and exhaust pipes get hot enough to burn/)).toBeTruthy();
    expect(screen.queryByText(/LiPo/)).toBeNull();
  });

  it('warns about charging LiPo and LiHV packs on an electric car, not about fuel', () => {
    renderThemed(<SafetyNote vehicleClass="buggy-1-10-2wd" />);
    expect(screen.getByText(/Charge LiPo and LiHV packs only on a charger set up for them, inside a fire-safe bag/)).toBeTruthy();
    expect(screen.queryByText(/Nitro fuel/)).toBeNull();
    expect(screen.queryByText(/Glow igniters/)).toBeNull();
  });

  it('always covers carbon-fibre dust and spinning drivetrains, and defers to instructions, rules and regulations', () => {
    for (const vehicleClass of ['buggy-1-8-nitro', 'buggy-1-8-electric'] as const) {
      const view = renderThemed(<SafetyNote vehicleClass={vehicleClass} />);
      expect(screen.getByText(/carbon-fibre parts makes harmful dust: cut them wet and wear a mask/)).toBeTruthy();
      expect(screen.getByText(/spinning drivetrain/)).toBeTruthy();
      expect(screen.getByText(/manufacturer’s instructions, your track’s rules and local regulations come first/)).toBeTruthy();
      view.unmount();
    }
  });

  it('fits the same cautions into one paragraph for the printed pit sheet', () => {
    renderThemed(<SafetyNote vehicleClass="buggy-1-8-nitro" compact />);
    expect(screen.queryByRole('header')).toBeNull();
    expect(screen.getByText(/Nitro fuel is toxic.*carbon-fibre.*local regulations come first/)).toBeTruthy();
  });
});
