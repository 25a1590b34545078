import fc from 'fast-check';
import {
  DIFF_OIL_GRADES_CST,
  SHOCK_OIL_GRADES_CST,
  STANDARD_OIL_GRADES_CST,
  TrackdayInputError,
  fitWaltherLine,
  nearestOilGrade,
  recommendOilForTemperature,
  siliconeGradeFor,
  siliconeOilCurve,
  siliconeOilLine,
  siliconeViscosityAt,
  viscosityAt,
  viscosityCurve,
} from '../../../shared/compute/trackday';

describe('ASTM D341 (Walther) two-point fit and evaluation', () => {
  // ASTM D341 two-point worked example as published in a public viscosity-temperature calculator
  // spreadsheet, which rounds kelvin to +273 and reports 8.5 cSt (with +273.15 we get 8.53).
  it('ASTM D341 worked example: 32 cSt at 40 °C and 5.4 cSt at 100 °C give about 8.5 cSt at 80 °C', () => {
    const line = fitWaltherLine(
      { temperatureC: 40, viscosityCst: 32 },
      { temperatureC: 100, viscosityCst: 5.4 },
    );
    expect(viscosityAt(line, 80)).toBeCloseTo(8.5, 1);
  });

  // ASTM D341 two-point worked example as published on a public viscosity-extrapolation page:
  // a gear oil of 404 cSt at 40 °C and 28 cSt at 100 °C has 132.126 cSt at 60 °C.
  it('ASTM D341 worked example: 404 cSt at 40 °C and 28 cSt at 100 °C give 132.1 cSt at 60 °C', () => {
    const line = fitWaltherLine(
      { temperatureC: 40, viscosityCst: 404 },
      { temperatureC: 100, viscosityCst: 28 },
    );
    expect(viscosityAt(line, 60)).toBeCloseTo(132.1, 1);
  });

  it('the fitted line passes back through both of its points', () => {
    fc.assert(fc.property(
      fc.double({ min: -20, max: 60, noNaN: true }),
      fc.double({ min: 5, max: 60, noNaN: true }),
      fc.double({ min: 10, max: 50000, noNaN: true }),
      fc.double({ min: 0.05, max: 0.9, noNaN: true }),
      (coldC, gapC, coldCst, ratio) => {
        const hotCst = Math.max(2, coldCst * ratio);
        fc.pre(hotCst < coldCst);
        const cold = { temperatureC: coldC, viscosityCst: coldCst };
        const hot = { temperatureC: coldC + gapC, viscosityCst: hotCst };
        const line = fitWaltherLine(cold, hot);
        expect(viscosityAt(line, cold.temperatureC) / coldCst).toBeCloseTo(1, 9);
        expect(viscosityAt(line, hot.temperatureC) / hotCst).toBeCloseTo(1, 9);
      },
    ));
  });

  it('refuses points at one temperature, rising viscosity and viscosities below 2 cSt', () => {
    const at40 = { temperatureC: 40, viscosityCst: 32 };
    expect(() => fitWaltherLine(at40, { temperatureC: 40, viscosityCst: 20 })).toThrow(
      'the two points must be at different temperatures',
    );
    expect(() => fitWaltherLine(at40, { temperatureC: 100, viscosityCst: 50 })).toThrow(
      'viscosity must fall as temperature rises',
    );
    expect(() => fitWaltherLine(at40, { temperatureC: 100, viscosityCst: 1 })).toThrow(
      'second point viscosity (cSt) must be between 2 and 10000000, got 1',
    );
    expect(() => viscosityAt({ a: Number.NaN, b: 1 }, 20)).toThrow(TrackdayInputError);
  });
});

describe('silicone oil model (grade at 25 °C, VTC 0.6: typical data-sheet figure, quoted from memory)', () => {
  it('reproduces ν(99 °C) / ν(38 °C) = 0.4 for any grade', () => {
    fc.assert(fc.property(fc.double({ min: 2, max: 1e6, noNaN: true }), (gradeCst) => {
      expect(siliconeViscosityAt(gradeCst, 99) / siliconeViscosityAt(gradeCst, 38)).toBeCloseTo(0.4, 9);
    }));
  });

  it('gives the grade itself at 25 °C and a thicker oil when colder', () => {
    fc.assert(fc.property(fc.double({ min: 2, max: 1e6, noNaN: true }), (gradeCst) => {
      expect(siliconeViscosityAt(gradeCst, 25) / gradeCst).toBeCloseTo(1, 9);
      expect(siliconeViscosityAt(gradeCst, 10)).toBeGreaterThan(gradeCst);
    }));
  });

  it('finds the grade back from a viscosity at any temperature', () => {
    fc.assert(fc.property(
      fc.double({ min: 20, max: 1e5, noNaN: true }),
      fc.double({ min: -20, max: 60, noNaN: true }),
      (gradeCst, temperatureC) => {
        const viscosityCst = siliconeViscosityAt(gradeCst, temperatureC);
        expect(siliconeGradeFor(viscosityCst, temperatureC) / gradeCst).toBeCloseTo(1, 6);
      },
    ));
  });

  it('honours another viscosity-temperature coefficient', () => {
    expect(siliconeViscosityAt(500, 99, 0.5) / siliconeViscosityAt(500, 38, 0.5)).toBeCloseTo(0.5, 9);
    expect(() => siliconeOilLine(500, 1.2)).toThrow(
      'viscosity-temperature coefficient must be between 0.05 and 0.9',
    );
  });

  it('gives a chart curve of evenly spaced points, thickest at the cold end', () => {
    const curve = siliconeOilCurve(600, { fromC: 0, toC: 40, pointCount: 5 });
    expect(curve.map((point) => point.temperatureC)).toEqual([0, 10, 20, 30, 40]);
    expect(curve[2].viscosityCst).toBeCloseTo(siliconeViscosityAt(600, 20), 9);
    for (let index = 1; index < curve.length; index += 1) {
      expect(curve[index].viscosityCst).toBeLessThan(curve[index - 1].viscosityCst);
    }
    expect(viscosityCurve(siliconeOilLine(600), { fromC: 0, toC: 40 })).toHaveLength(41);
    expect(() => siliconeOilCurve(600, { fromC: 40, toC: 0 })).toThrow('curve start must be below curve end');
  });
});

describe('oil grades racers can buy (common practice, no source)', () => {
  it('lists shock grades 100–1000 in steps of 50 and common diff grades, sorted and unique', () => {
    expect(SHOCK_OIL_GRADES_CST[0]).toBe(100);
    expect(SHOCK_OIL_GRADES_CST[SHOCK_OIL_GRADES_CST.length - 1]).toBe(1000);
    expect(SHOCK_OIL_GRADES_CST).toContain(650);
    expect(DIFF_OIL_GRADES_CST).toEqual(expect.arrayContaining([1000, 2000, 3000, 5000, 7000, 10000, 100000]));
    expect([...STANDARD_OIL_GRADES_CST].sort((a, b) => a - b)).toEqual(STANDARD_OIL_GRADES_CST);
    expect(new Set(STANDARD_OIL_GRADES_CST).size).toBe(STANDARD_OIL_GRADES_CST.length);
  });

  it('snaps to the nearest grade by ratio', () => {
    expect(nearestOilGrade(490)).toBe(500);
    expect(nearestOilGrade(443)).toBe(450);
    expect(nearestOilGrade(6000)).toBe(7000);
    expect(nearestOilGrade(40)).toBe(100);
    expect(nearestOilGrade(330, [300, 400])).toBe(300);
    expect(() => nearestOilGrade(500, [])).toThrow('the list of oil grades to choose from is empty');
    expect(() => nearestOilGrade(-5)).toThrow('viscosity (cSt) must be more than 0, got -5');
  });
});

describe('oil for today’s temperature', () => {
  // Common practice, no source (temperatures approximate): a 600 cSt front shock oil set up at
  // about 30 °C goes to about 500 cSt at about 10 °C and about 450 cSt at about 1 °C.
  it.each([
    [10, 500, 400],
    [1, 450, 330],
  ])('600 cSt set up at 30 °C, today %s °C: half-way lands within 50 cSt of %s, full compensation near %s', (
    todayC, practiceCst, fullCst,
  ) => {
    const advice = recommendOilForTemperature({
      setupGradeCst: 600,
      setupTemperatureC: 30,
      todayTemperatureC: todayC,
    });
    expect(Math.abs(advice.partialCompensation.nearestGradeCst - practiceCst)).toBeLessThanOrEqual(50);
    expect(advice.partialCompensation.fraction).toBe(0.5);
    expect(advice.fullCompensation.exactGradeCst).toBeGreaterThan(fullCst * 0.93);
    expect(advice.fullCompensation.exactGradeCst).toBeLessThan(fullCst * 1.07);
  });

  it('full compensation matches today the viscosity the setup oil had on its day', () => {
    const advice = recommendOilForTemperature({
      setupGradeCst: 600,
      setupTemperatureC: 30,
      todayTemperatureC: 10,
    });
    const fullGradeToday = siliconeViscosityAt(advice.fullCompensation.exactGradeCst, 10);
    expect(fullGradeToday / advice.setupViscosityThenCst).toBeCloseTo(1, 6);
    expect(advice.setupViscosityThenCst).toBeCloseTo(siliconeViscosityAt(600, 30), 9);
    expect(advice.setupViscosityTodayCst).toBeGreaterThan(advice.setupViscosityThenCst);
  });

  it('partial compensation lies the given fraction of the way in log viscosity', () => {
    fc.assert(fc.property(
      fc.double({ min: 100, max: 50000, noNaN: true }),
      fc.double({ min: -10, max: 50, noNaN: true }),
      fc.double({ min: -10, max: 50, noNaN: true }),
      fc.double({ min: 0, max: 1, noNaN: true }),
      (setupGradeCst, setupTemperatureC, todayTemperatureC, compensationFraction) => {
        const advice = recommendOilForTemperature({
          setupGradeCst, setupTemperatureC, todayTemperatureC, compensationFraction,
        });
        const full = Math.log(advice.fullCompensation.exactGradeCst / setupGradeCst);
        const partial = Math.log(advice.partialCompensation.exactGradeCst / setupGradeCst);
        expect(partial).toBeCloseTo(compensationFraction * full, 6);
        expect(STANDARD_OIL_GRADES_CST).toContain(advice.partialCompensation.nearestGradeCst);
      },
    ));
  });

  it('the same temperature changes nothing', () => {
    const advice = recommendOilForTemperature({
      setupGradeCst: 450,
      setupTemperatureC: 22,
      todayTemperatureC: 22,
    });
    expect(advice.fullCompensation.exactGradeCst).toBeCloseTo(450, 4);
    expect(advice.partialCompensation.nearestGradeCst).toBe(450);
  });

  it('snaps to the caller’s own grades when given', () => {
    const advice = recommendOilForTemperature({
      setupGradeCst: 600, setupTemperatureC: 30, todayTemperatureC: 10, availableGradesCst: [450, 550, 600],
    });
    expect(advice.partialCompensation.nearestGradeCst).toBe(450);
    expect(advice.fullCompensation.nearestGradeCst).toBe(450);
  });

  it('refuses impossible temperatures, grades and fractions with a clear error', () => {
    const base = { setupGradeCst: 600, setupTemperatureC: 30, todayTemperatureC: 10 };
    expect(() => recommendOilForTemperature({ ...base, todayTemperatureC: 150 })).toThrow(
      "today's track temperature (°C) must be between -30 and 70, got 150",
    );
    expect(() => recommendOilForTemperature({ ...base, setupGradeCst: Number.NaN })).toThrow(
      'oil grade (cSt) must be a finite number, got NaN',
    );
    expect(() => recommendOilForTemperature({ ...base, compensationFraction: 2 })).toThrow(
      'compensation fraction must be between 0 and 1, got 2',
    );
  });
});
