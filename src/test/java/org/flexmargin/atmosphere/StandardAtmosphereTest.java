package org.flexmargin.atmosphere;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class StandardAtmosphereTest {

  /**
   * U.S. Standard Atmosphere 1976 by geometric altitude, as printed in Kutz (ed.), <i>Mechanical
   * Engineers' Handbook</i>, vol. 4, Table 6 (docs/validation.md section 2.1).
   * The table rounds to the digits shown, so T, p and rho are checked to half a unit of their last
   * printed digit (plus 1e-9 for floating-point noise): a model error larger than the table's own
   * rounding fails. The speed-of-sound column is checked to one unit (0.1 m/s): it looks rounded
   * twice (5 000 m prints 320.6 where the standard's 320.55 (from memory), and the model's
   * 320.545, round to 320.5).
   */
  @ParameterizedTest(name = "Z = {0} m")
  @CsvSource({
    // Z (m), T (K), p (bar), rho (kg/m^3), a (m/s)
    "0,     288.15, 1.0133, 1.2250, 340.3",
    "1000,  281.65, 0.8988, 1.1117, 336.4",
    "2000,  275.15, 0.7950, 1.0066, 332.5",
    "3000,  268.66, 0.7012, 0.9093, 328.6",
    "5000,  255.68, 0.5405, 0.7364, 320.6",
    "8000,  236.22, 0.3565, 0.5258, 308.1",
    "10000, 223.25, 0.2650, 0.4135, 299.5",
    "11000, 216.77, 0.2270, 0.3648, 295.2",
    "12000, 216.65, 0.1940, 0.3119, 295.1"
  })
  void matchesHandbookTable(double z, double tK, double pBar, double rho, double a) {
    FlightCondition fc = StandardAtmosphere.at(z, 0.0);
    assertEquals(tK, fc.temperatureK(), 0.005 + 1e-9, "T");
    assertEquals(pBar, fc.pressurePa() / 1e5, 0.00005 + 1e-9, "p");
    assertEquals(rho, fc.densityKgPerM3(), 0.00005 + 1e-9, "rho");
    assertEquals(a, fc.speedOfSoundMps(), 0.1 + 1e-9, "a");
  }

  @Test
  void tropopauseAtElevenKilometresGeopotential() {
    // US Standard Atmosphere 1976: 22 632 Pa and 216.65 K at 11 km geopotential (published;
    // docs/validation.md 2.1); the standard tabulates the layer-base pressure as 22 632.06 Pa (from memory).
    // Tolerance 0.5 Pa: the rounding of the quoted 22 632.
    double z = StandardAtmosphere.geometricAltitudeM(11_000.0);
    assertEquals(11_019.07, z, 0.01); // r0 h / (r0 - h) with r0 = 6 356 766 m, closed form
    assertEquals(22_632.0, StandardAtmosphere.pressurePa(z), 0.5);
    assertEquals(216.65, StandardAtmosphere.temperatureK(z), 1e-9);
    // rho = 0.36392 kg/m^3 [derived, docs/validation.md 2.1]; half a unit of the 5th digit.
    assertEquals(0.36392, StandardAtmosphere.densityKgPerM3(z), 0.000005);
    // The pitfall named in docs/validation.md 2.1: at 11 000 m *geometric* the pressure is 22 700 Pa.
    assertEquals(22_700.0, StandardAtmosphere.pressurePa(11_000.0), 0.5);
  }

  @Test
  void twentyKilometresGeometric() {
    // docs/validation.md 2.1 [derived from the layer model]: rho = 0.08891 kg/m^3, p = 5 529 Pa at
    // 20 000 m geometric. Tolerances half a unit of the last quoted digit.
    assertEquals(0.08891, StandardAtmosphere.densityKgPerM3(20_000.0), 0.000005);
    assertEquals(5_529.0, StandardAtmosphere.pressurePa(20_000.0), 0.5);
  }

  @Test
  void layerBasePressuresOfTheStandard() {
    // US Standard Atmosphere 1976, table 4 layer-base pressures (from memory): 5 474.889 Pa at
    // 20 km', 868.0187 Pa at 32 km', 110.9063 Pa at 47 km', 66.93887 Pa at 51 km',
    // 3.956420 Pa at 71 km'. Relative 1e-6: the standard prints 7 significant digits.
    double[] h = {20_000, 32_000, 47_000, 51_000, 71_000};
    double[] p = {5474.889, 868.0187, 110.9063, 66.93887, 3.956420};
    for (int i = 0; i < h.length; i++) {
      double got = StandardAtmosphere.pressurePa(StandardAtmosphere.geometricAltitudeM(h[i]));
      assertEquals(p[i], got, 1e-6 * p[i], "base " + h[i]);
    }
  }

  @Test
  void topOfTheModel() {
    // US Standard Atmosphere 1976 at 86 km geometric (from memory): p = 0.37338 Pa,
    // T = 186.87 K (kinetic; molecular-scale 186.946 K), rho = 6.958e-6 kg/m^3.
    // Tolerances half a unit of the last remembered digit.
    assertEquals(0.37338, StandardAtmosphere.pressurePa(86_000.0), 0.000005);
    assertEquals(186.87, StandardAtmosphere.temperatureK(86_000.0), 0.005);
    assertEquals(6.958e-6, StandardAtmosphere.densityKgPerM3(86_000.0), 0.0005e-6);
  }

  @Test
  void pressureSatisfiesHydrostaticEquationWithInverseSquareGravity() {
    // Independent general-purpose computation: integrate dp/dZ = -rho g, with
    // g = g0 (r0 / (r0 + Z))^2 and rho = p / (R T), i.e. ln(p / p0) = -int g / (R T) dZ, using
    // Commons Math Gauss-Legendre quadrature on panels split at the layer bases (where T has
    // kinks). Checks the geopotential conversion and the closed-form layer laws, up to 80 km where
    // kinetic and molecular-scale temperature agree. Tolerance 1e-9 relative: the quadrature is
    // converged to 1e-13 on each smooth panel, far below it.
    IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-16);
    double r0 = StandardAtmosphere.EARTH_RADIUS_M;
    java.util.TreeSet<Double> breaks = new java.util.TreeSet<>();
    for (double z = 0.0; z <= 80_000.0; z += 5_000.0) {
      breaks.add(z);
    }
    for (double h : new double[] {11_000, 20_000, 32_000, 47_000, 51_000, 71_000}) {
      breaks.add(StandardAtmosphere.geometricAltitudeM(h));
    }
    double lnP = Math.log(StandardAtmosphere.SEA_LEVEL_PRESSURE_PA);
    double prev = 0.0;
    int checked = 0;
    for (double z : breaks.tailSet(0.0, false)) {
      lnP -= quad.integrate(10_000, zz -> {
        double g = StandardAtmosphere.G0_MPS2 * Math.pow(r0 / (r0 + zz), 2);
        return g / (StandardAtmosphere.SPECIFIC_GAS_CONSTANT_J_PER_KG_K
            * StandardAtmosphere.temperatureK(zz));
      }, prev, z);
      prev = z;
      double model = StandardAtmosphere.pressurePa(z);
      assertEquals(Math.exp(lnP), model, 1e-9 * model, "Z = " + z);
      checked++;
    }
    assertEquals(22, checked);
  }

  @Test
  void densityAndSpeedOfSoundObeyTheGasLaws() {
    // Closed forms: rho = p / (R T), a = sqrt(gamma p / rho), R = R* / M0 = 8314.32 / 28.9644
    // = 287.0531 J/(kg K) with the US76 constants (docs/validation.md 2.1). ISO 2533 quotes
    // 287.05287 (from memory), 7e-7 relative lower; the program uses the US76 pair throughout.
    // Tolerance 1e-9 relative: rounding only.
    assertEquals(8314.32 / 28.9644, StandardAtmosphere.SPECIFIC_GAS_CONSTANT_J_PER_KG_K, 1e-12);
    assertEquals(287.0531, StandardAtmosphere.SPECIFIC_GAS_CONSTANT_J_PER_KG_K, 0.00005);
    for (double z = -5000; z <= 80_000; z += 2500) {
      FlightCondition fc = StandardAtmosphere.at(z, 0.0);
      assertEquals(fc.pressurePa() / (8314.32 / 28.9644 * fc.temperatureK()), fc.densityKgPerM3(),
          1e-9 * fc.densityKgPerM3());
      assertEquals(Math.sqrt(1.4 * fc.pressurePa() / fc.densityKgPerM3()), fc.speedOfSoundMps(),
          1e-12 * fc.speedOfSoundMps());
    }
  }

  @Test
  void equivalentAndTrueAirspeed() {
    // Example of AirspeedKind's Javadoc, derived from the handbook density 0.7364 kg/m^3 at 5 km
    // (docs/validation.md 2.2): 100 m/s EAS = 100 sqrt(1.225 / 0.7364) = 128.98 m/s TAS, and 100 m/s
    // TAS = 77.53 m/s EAS. Tolerance 0.01 m/s: the 4-digit table density gives 1e-4 relative.
    FlightCondition eas = StandardAtmosphere.atEquivalentSpeed(5000.0, 100.0);
    assertEquals(128.98, eas.speedTasMps(), 0.01);
    assertEquals(100.0, eas.speedEasMps(), 1e-12);
    FlightCondition tas = StandardAtmosphere.of(5000.0, 100.0, AirspeedKind.TRUE);
    assertEquals(77.53, tas.speedEasMps(), 0.01);
    FlightCondition viaOf = StandardAtmosphere.of(5000.0, 100.0, AirspeedKind.EQUIVALENT);
    assertEquals(eas.speedTasMps(), viaOf.speedTasMps(), 0.0);
    // At sea level EAS = TAS by definition; rho(0) = 1.2250 to 4 digits (handbook row).
    assertEquals(150.0, StandardAtmosphere.atEquivalentSpeed(0.0, 150.0).speedTasMps(), 1e-4);
    // q = rho V^2 / 2 = rho0 V_EAS^2 / 2 (definition of EAS), 1e-12 relative.
    assertEquals(0.5 * 1.225 * 100.0 * 100.0, eas.dynamicPressurePa(), 1e-9);
  }

  @Test
  void machNumber() {
    // Handbook row at 11 000 m: a = 295.2 m/s, so M 0.8 is 236.2 m/s TAS (+-0.04 from rounding).
    FlightCondition fc = StandardAtmosphere.atMach(11_000.0, 0.8);
    assertEquals(0.8 * 295.2, fc.speedTasMps(), 0.04);
    assertEquals(0.8, fc.mach(), 1e-12);
  }

  /**
   * docs/validation.md 2.2 [derived]: V_EAS = M sqrt(gamma p / rho0), so +15 % EAS at constant Mach is
   * static pressure x 1.3225; for the US76 model 11 000 m -> 9 173 m, 9 000 m -> 7 065 m,
   * 6 000 m -> 3 903 m geometric. Tolerance 1 m: the quoted altitudes are rounded to the metre.
   */
  @ParameterizedTest
  @CsvSource({"11000, 9173", "9000, 7065", "6000, 3903"})
  void fifteenPercentEquivalentSpeedAtConstantMach(double from, double expectedTo) {
    double to = StandardAtmosphere.altitudeAtPressureM(1.3225 * StandardAtmosphere.pressurePa(from));
    assertEquals(expectedTo, to, 1.0);
    // And directly from flight conditions: EAS at the same Mach is 15 % higher (1e-9 relative).
    double mach = 0.7;
    double easFrom = StandardAtmosphere.atMach(from, mach).speedEasMps();
    double easTo = StandardAtmosphere.atMach(to, mach).speedEasMps();
    assertEquals(1.15 * easFrom, easTo, 1e-9 * easTo);
  }

  @Test
  void pressureInverseRoundTripsOverTheWholeRange() {
    // Consistency of the inverse with the forward model, 1e-6 m: both are closed forms.
    for (double z = -5000; z <= 86_000; z += 1000) {
      double back = StandardAtmosphere.altitudeAtPressureM(StandardAtmosphere.pressurePa(z));
      assertEquals(z, back, 1e-6, "Z = " + z);
    }
  }

  @Test
  void rejectsOutOfRangeInput() {
    InvalidInputException e =
        assertThrows(InvalidInputException.class, () -> StandardAtmosphere.at(86_001.0, 100.0));
    assertEquals("altitude_m", e.fieldPath());
    assertThrows(InvalidInputException.class, () -> StandardAtmosphere.at(-5_001.0, 100.0));
    assertThrows(InvalidInputException.class, () -> StandardAtmosphere.at(Double.NaN, 100.0));
    assertThrows(InvalidInputException.class, () -> StandardAtmosphere.at(1000.0, -1.0));
    assertThrows(InvalidInputException.class,
        () -> StandardAtmosphere.atEquivalentSpeed(1000.0, Double.POSITIVE_INFINITY));
    assertThrows(InvalidInputException.class, () -> StandardAtmosphere.atMach(1000.0, -0.1));
    assertThrows(InvalidInputException.class, () -> StandardAtmosphere.of(1000.0, 10.0, null));
    assertThrows(InvalidInputException.class, () -> StandardAtmosphere.altitudeAtPressureM(2e5));
    // Range ends themselves are valid.
    assertTrue(StandardAtmosphere.at(86_000.0, 0.0).densityKgPerM3() > 0);
    assertTrue(StandardAtmosphere.at(-5_000.0, 0.0).densityKgPerM3() > 1.225);
  }
}
