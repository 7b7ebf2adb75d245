package io.github.startransport.cli;

import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Timescales;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * A diagnosis built by hand for testing the writers and plots without any physics. The numbers
 * are invented (smooth shapes of roughly stellar magnitude); they satisfy no structure equation.
 */
final class HandMadeDiagnosis {
    static final int ZONES = 60;
    static final double RADIUS = 7.0e10;
    static final double MASS = 2.0e33;

    /** Region boundaries as r/R: an inner convective core, a semiconvective shell, a convective envelope. */
    static final double CORE_TOP = 0.12;
    static final double SEMI_BOTTOM = 0.30;
    static final double SEMI_TOP = 0.36;
    static final double ENVELOPE_BOTTOM = 0.70;
    /** Where overshoot mixing ends above the core and below the envelope, as r/R. */
    static final double CORE_OVERSHOOT_TOP = 0.15;
    static final double ENVELOPE_OVERSHOOT_BOTTOM = 0.66;
    /** Margins on the convective side of the core's top and the envelope's bottom. */
    static final double CORE_MARGIN_TOP = 0.3;
    static final double ENVELOPE_MARGIN_BOTTOM = -0.001;

    static final double PHOTON_S = 5.0e12;
    static final double THERMAL_S = 8.0e13;
    static final double KH_S = 9.9e14;
    static final double CORE_TURNOVER_GLOBAL_S = 3.0e6;
    static final double CORE_TURNOVER_LOCAL_S = 1.0e6;
    static final double CORE_MAX_V = 2.0e4;
    static final double ENVELOPE_TURNOVER_GLOBAL_S = 2.5e7;
    static final double ENVELOPE_TURNOVER_LOCAL_S = 4.0e6;
    static final double ENVELOPE_MAX_V = 5.0e5;

    private HandMadeDiagnosis() {
    }

    static double fraction(int k) {
        return (k + 1.0) / ZONES;
    }

    static Regime regime(double f) {
        if (f <= CORE_TOP || f >= ENVELOPE_BOTTOM) {
            return Regime.CONVECTIVE;
        }
        if (f >= SEMI_BOTTOM && f <= SEMI_TOP) {
            return Regime.SEMICONVECTIVE;
        }
        return Regime.RADIATIVE;
    }

    static ProfileDiagnosis build() {
        Map<DiagnosisColumn, double[]> c = new EnumMap<>(DiagnosisColumn.class);
        for (DiagnosisColumn col : DiagnosisColumn.values()) {
            c.put(col, new double[ZONES]);
        }
        Regime[] regimes = new Regime[ZONES];
        for (int k = 0; k < ZONES; k++) {
            double f = fraction(k);
            Regime regime = regime(f);
            regimes[k] = regime;
            double t = 1.5e7 * Math.pow(1 - 0.9996 * f, 1.6) + 5.8e3;
            double rho = 150 * Math.exp(-10 * f) + 1e-7;
            double m = MASS * Math.pow(f, 1.5);
            double p = rho * t * 1.38e-16 / (0.62 * 1.66e-24);
            double g = 6.674e-8 * m / Math.pow(f * RADIUS, 2);
            double nablaRad = regime == Regime.CONVECTIVE ? 0.6 + 3 * Math.max(0, f - ENVELOPE_BOTTOM) * 30
                    : regime == Regime.SEMICONVECTIVE ? 0.43 : 0.2 + 0.1 * f;
            boolean conv = regime == Regime.CONVECTIVE;
            put(c, DiagnosisColumn.RADIUS, k, f * RADIUS);
            put(c, DiagnosisColumn.MASS, k, m);
            put(c, DiagnosisColumn.TEMPERATURE, k, t);
            put(c, DiagnosisColumn.DENSITY, k, rho);
            put(c, DiagnosisColumn.PRESSURE, k, p);
            put(c, DiagnosisColumn.LUMINOSITY, k, 3.8e33 * Math.min(1, 4 * f));
            put(c, DiagnosisColumn.HYDROGEN, k, 0.7);
            put(c, DiagnosisColumn.METALS, k, 0.02);
            put(c, DiagnosisColumn.OPACITY, k, 0.4 + 1e23 * rho * Math.pow(t, -3.5) * 1e3);
            put(c, DiagnosisColumn.CP, k, 3.3e8);
            put(c, DiagnosisColumn.DELTA, k, 1.0);
            put(c, DiagnosisColumn.NABLA_AD, k, 0.4);
            put(c, DiagnosisColumn.NABLA_MU, k, regime == Regime.SEMICONVECTIVE ? 0.1 : 0.0);
            put(c, DiagnosisColumn.GRAVITY, k, g);
            put(c, DiagnosisColumn.SCALE_HEIGHT, k, p / (rho * g));
            put(c, DiagnosisColumn.NABLA_RAD, k, nablaRad);
            put(c, DiagnosisColumn.NABLA_LEDOUX, k, regime == Regime.SEMICONVECTIVE ? 0.5 : 0.4);
            put(c, DiagnosisColumn.NABLA, k, conv ? 0.4 + 1e-4 * (1 + 100 * Math.max(0, f - 0.95)) : nablaRad);
            put(c, DiagnosisColumn.NABLA_MODEL, k, 0.25);
            put(c, DiagnosisColumn.NABLA_MISMATCH, k, 0.5 * f);
            put(c, DiagnosisColumn.NABLA_ELEMENT, k, conv ? 0.4 + 5e-5 : nablaRad);
            put(c, DiagnosisColumn.VELOCITY, k, conv ? 1e4 * (1 + 50 * f * f) : 0.0);
            put(c, DiagnosisColumn.CONVECTIVE_FRACTION, k, conv ? 0.99 - 0.5 * Math.max(0, f - 0.95) : 0.0);
            boolean overshot = (f > CORE_TOP && f <= CORE_OVERSHOOT_TOP)
                    || (f >= ENVELOPE_OVERSHOOT_BOTTOM && f < ENVELOPE_BOTTOM);
            put(c, DiagnosisColumn.OVERSHOOT_DIFFUSION, k, overshot ? 1e8 : 0.0);
            put(c, DiagnosisColumn.DIFFUSION, k, conv ? 1e13 * (1 + 50 * f * f)
                    : regime == Regime.SEMICONVECTIVE ? 1e3 : overshot ? 1e8 : 0.0);
        }
        List<Region> regions = List.of(
                region(Regime.CONVECTIVE, 0.0, CORE_TOP, OptionalDouble.of(CORE_TURNOVER_GLOBAL_S),
                        OptionalDouble.of(CORE_TURNOVER_LOCAL_S), OptionalDouble.of(CORE_MAX_V))
                        .withEdges(OptionalDouble.empty(), OptionalDouble.of(CORE_OVERSHOOT_TOP * RADIUS),
                                OptionalDouble.empty(), OptionalDouble.of(CORE_MARGIN_TOP)),
                region(Regime.SEMICONVECTIVE, SEMI_BOTTOM, SEMI_TOP, OptionalDouble.empty(), OptionalDouble.empty(),
                        OptionalDouble.empty()),
                region(Regime.CONVECTIVE, ENVELOPE_BOTTOM, 1.0, OptionalDouble.of(ENVELOPE_TURNOVER_GLOBAL_S),
                        OptionalDouble.of(ENVELOPE_TURNOVER_LOCAL_S), OptionalDouble.of(ENVELOPE_MAX_V))
                        .withEdges(OptionalDouble.of(ENVELOPE_OVERSHOOT_BOTTOM * RADIUS), OptionalDouble.empty(),
                                OptionalDouble.of(ENVELOPE_MARGIN_BOTTOM), OptionalDouble.empty()));
        return new ProfileDiagnosis("hand-made", Criterion.LEDOUX, 1.7, c, regimes, regions,
                new Timescales(PHOTON_S, THERMAL_S, KH_S), List.of("invented numbers for testing"));
    }

    private static void put(Map<DiagnosisColumn, double[]> c, DiagnosisColumn col, int k, double v) {
        c.get(col)[k] = v;
    }

    static Region region(Regime regime, double bottom, double top, OptionalDouble global, OptionalDouble local,
                         OptionalDouble vmax) {
        return new Region(regime, bottom * RADIUS, top * RADIUS, MASS * Math.pow(bottom, 1.5),
                MASS * Math.pow(top, 1.5), bottom, top, Math.pow(bottom, 1.5), Math.pow(top, 1.5), 2.0,
                OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                global, local, vmax, 0, 0);
    }
}
