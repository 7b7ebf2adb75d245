package io.github.startransport.core.robustness;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.convection.TransparentEddyMixingLength;
import io.github.startransport.core.gradient.GradientStability;
import io.github.startransport.core.gradient.IdealGasRadiation;
import io.github.startransport.core.model.DemoStar;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.core.opacity.DemoTable;
import io.github.startransport.core.opacity.TabulatedOpacity;
import io.github.startransport.core.profile.LocalDiagnosis;
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.DiagnosisColumn;
import io.github.startransport.spi.DiagnosisSetup;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.OpacityResult;
import io.github.startransport.spi.OutOfRangePolicy;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.TransportException;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Tag;
import net.jqwik.api.Tuple;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.statistics.Statistics;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Random extreme states for every hot-path call. The only outcomes allowed: a result whose every
 * output is finite and inside its range, or one of our {@link TransportException}s with a message.
 * Any other exception fails the property by escaping; a hang would fail the build by timing out
 * (every iteration in the library is bounded). The counts of accepted and refused inputs are
 * printed with the test report, and each property fails when either outcome falls below the share
 * its inputs are built for (jqwik coverage checks), so a fuzzer that only ever hits the guards, or
 * never hits them, is caught.
 */
class HotPathFuzzTest {

    private static final List<ConvectionModel> CONVECTION = List.of(new LocalMixingLength(),
            new LocalMixingLength().withAlpha(1e-3), new TransparentEddyMixingLength(),
            new TransparentEddyMixingLength().withAlpha(5.0),
            LocalMixingLength.fromOptions(ModelOptions.parse("criterion=ledoux")));
    private static final List<OpacityModel> OPACITY = List.of(AnalyticOpacity.DEFAULT,
            new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.REFUSE),
            new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.CLAMP),
            new TabulatedOpacity(DemoTable.set(), OutOfRangePolicy.EXTRAPOLATE));

    /** Any double: mostly plausible magnitudes, often extreme ones, sometimes special values. */
    @Provide
    Arbitrary<Double> extreme() {
        return Arbitraries.frequencyOf(
                Tuple.of(4, Arbitraries.doubles().between(-30, 30).ofScale(9).map(e -> Math.pow(10.0, e))),
                Tuple.of(2, Arbitraries.doubles().between(-300, 300).ofScale(9).map(e -> Math.pow(10.0, e))),
                Tuple.of(1, Arbitraries.doubles().between(-300, 300).ofScale(9).map(e -> -Math.pow(10.0, e))),
                Tuple.of(1, Arbitraries.of(Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0, -0.0,
                        Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, 1.0, 0.999999999, 1e-308)));
    }

    /** A fraction: mostly in [0, 1], sometimes outside or special. */
    @Provide
    Arbitrary<Double> fraction() {
        return Arbitraries.frequencyOf(
                Tuple.of(8, Arbitraries.doubles().between(0.0, 1.0).ofScale(9)),
                Tuple.of(1, Arbitraries.of(0.0, 1.0, -1e-12, 1.0 + 1e-12, Double.NaN, 0.5)),
                Tuple.of(1, Arbitraries.doubles().between(-2.0, 2.0).ofScale(9)));
    }

    private static ZoneState zone(double t, double rho, double p, double l, double m, double r, double kappa,
                                  double cp, double nablaAd, double delta, double nablaMu, double x, double z) {
        ZoneState s = new ZoneState();
        s.zone = 7;
        s.temperature = t;
        s.density = rho;
        s.pressure = p;
        s.luminosity = l;
        s.mass = m;
        s.radius = r;
        s.opacity = kappa;
        s.cp = cp;
        s.nablaAd = nablaAd;
        s.delta = delta;
        s.nablaMu = nablaMu;
        s.phi = 1.0;
        s.hydrogen = x;
        s.metals = z;
        return s;
    }

    private static void refused(String call, TransportException e) {
        Statistics.label(call).collect("refused");
        assertNotNull(e.getMessage());
        assertTrue(!e.getMessage().isBlank(), call + ": empty message");
    }

    private static void finite(double v, String what, Object context) {
        assertTrue(Double.isFinite(v), what + " = " + v + " for " + context);
    }

    private static void finite(double[] d, String what, Object context) {
        for (int i = 0; i < ZoneInput.COUNT; i++) {
            assertTrue(Double.isFinite(d[i]), what + "/d" + ZoneInput.name(i) + " = " + d[i] + " for " + context);
        }
    }

    /** The demo star's zones, a plausible base that one random field spoils in half the tries. */
    private static final ZoneColumns DEMO = BatchColumns.demo();

    /**
     * 0: every field random; 1: a zone of the demo star with field {@code spoiled} replaced by its random
     * value, so that a fair share of calls is accepted and reaches the solvers' convective branch.
     */
    @Provide
    Arbitrary<Integer> mode() {
        return Arbitraries.of(0, 1);
    }

    /**
     * Each call's outcomes in the share of calls the inputs are built for: at least 10 % accepted
     * (the call reached its computation) and at least 10 % refused (the guards were exercised). Design
     * targets of this test, not physics; jqwik fails the property when a share falls short.
     */
    private static void outcomeShares(String call) {
        Statistics.label(call).coverage(c -> {
            c.check("accepted").percentage(p -> p >= 10.0);
            c.check("refused").percentage(p -> p >= 10.0);
        });
    }

    @Tag("internal")
    @Property(tries = 3000, seed = "7101")
    void hotPathCallsGiveAFiniteResultOrOurException(
            @ForAll("extreme") double t, @ForAll("extreme") double rho, @ForAll("extreme") double p,
            @ForAll("extreme") double l, @ForAll("extreme") double m, @ForAll("extreme") double r,
            @ForAll("extreme") double kappa, @ForAll("extreme") double cp, @ForAll("fraction") double nablaAd,
            @ForAll("extreme") double delta, @ForAll("extreme") double nablaMu, @ForAll("fraction") double x,
            @ForAll("fraction") double z, @ForAll("mode") int mode, @ForAll @IntRange(min = 0, max = 12) int spoiled,
            @ForAll @IntRange(min = 0, max = 99) int demoZone) {
        ZoneState s;
        if (mode == 0) {
            s = zone(t, rho, p, l, m, r, kappa, cp, nablaAd, delta, nablaMu, x, z * (1.0 - Math.abs(x)));
        } else {
            int k = demoZone % DEMO.capacity;
            double[] v = {DEMO.temperature[k], DEMO.density[k], DEMO.pressure[k], DEMO.luminosity[k], DEMO.mass[k],
                DEMO.radius[k], DEMO.opacity[k], DEMO.cp[k], DEMO.nablaAd[k], DEMO.delta[k], DEMO.nablaMu[k],
                DEMO.hydrogen[k], DEMO.metals[k]};
            v[spoiled] = new double[] {t, rho, p, l, m, r, kappa, cp, nablaAd, delta, nablaMu, x, z}[spoiled];
            s = zone(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], v[9], v[10], v[11], v[12]);
        }
        for (String call : List.of("stability", "convection with Jacobian", "convection values", "opacity analytic",
                "opacity table", "thermodynamics")) {
            outcomeShares(call);
        }
        // the accepted convection calls include convective zones, where the cubic is solved
        Statistics.label("convection regime").coverage(c -> {
            c.check(Regime.CONVECTIVE).percentage(q -> q >= 5.0);
            c.check(Regime.SEMICONVECTIVE).count(n -> n >= 10);
            c.check(Regime.THERMOHALINE).count(n -> n >= 10);
        });
        for (Criterion criterion : Criterion.values()) {
            StabilityResult out = new StabilityResult();
            try {
                new GradientStability(criterion).evaluate(s, out);
                Statistics.label("stability").collect("accepted");
                assertNotNull(out.regime);
                finite(out.nablaRad, "nabla_rad", s);
                finite(out.nablaLedoux, "nabla_L", s);
                finite(out.dNablaRad, "nabla_rad", s);
                finite(out.dNablaLedoux, "nabla_L", s);
            } catch (TransportException e) {
                refused("stability", e);
            }
        }
        for (ConvectionModel model : CONVECTION) {
            for (boolean jacobian : new boolean[] {true, false}) {
                String call = jacobian ? "convection with Jacobian" : "convection values";
                ConvectionResult out = new ConvectionResult();
                try {
                    if (jacobian) {
                        model.solve(s, out);
                    } else {
                        model.solveValues(s, out);
                    }
                    Statistics.label(call).collect("accepted");
                    Statistics.label("convection regime").collect(out.regime);
                    Object context = model + " " + s;
                    assertNotNull(out.regime);
                    for (double v : new double[] {out.nablaRad, out.nabla, out.nablaElement, out.velocity,
                            out.convectiveFraction, out.radiativeFraction, out.efficiency, out.lossParameter,
                            out.scaleHeight, out.mixingLength, out.diffusion}) {
                        finite(v, "an output", context);
                    }
                    assertTrue(out.velocity >= 0.0 && out.diffusion >= 0.0 && out.efficiency >= 0.0, "signs " + context);
                    if (out.regime == Regime.CONVECTIVE && s.nablaMu >= 0.0) {
                        // thermally driven convection carries part of the flux: nabla_ad <= nabla_e <= nabla <= nabla_rad
                        // and the two flux fractions are in [0, 1] and add up to 1 (Kippenhahn, Weigert & Weiss 2012
                        // ch. 7); the slack is rounding relative to the largest gradient. (With nabla_mu < 0 the
                        // composition drives the motion and heat may flow inwards: nabla > nabla_rad, F_conv < 0; see
                        // CompositionConvectionTest.)
                        double slack = 1e-12 * Math.abs(out.nablaRad);
                        assertTrue(s.nablaAd <= out.nablaElement + slack && out.nablaElement <= out.nabla + slack
                                && out.nabla <= out.nablaRad + slack, "gradient order " + out + " for " + context);
                        assertTrue(out.convectiveFraction >= 0.0 && out.convectiveFraction <= 1.0
                                && Math.abs(out.convectiveFraction + out.radiativeFraction - 1.0) <= 1e-12,
                                "flux fractions " + out + " for " + context);
                    }
                    if (jacobian) {
                        finite(out.dNabla, "nabla", context);
                        finite(out.dVelocity, "v", context);
                        finite(out.dConvectiveFraction, "Fconv/F", context);
                        finite(out.dDiffusion, "D", context);
                    }
                } catch (TransportException e) {
                    refused(call, e);
                }
            }
        }
        for (OpacityModel model : OPACITY) {
            OpacityResult out = new OpacityResult();
            String call = model instanceof AnalyticOpacity ? "opacity analytic" : "opacity table";
            try {
                model.evaluate(s.temperature, s.density, s.hydrogen, s.metals, s.zone, out);
                Statistics.label(call).collect("accepted");
                assertTrue(out.kappa > 0.0 && Double.isFinite(out.kappa), "kappa = " + out.kappa + " for " + s);
                finite(out.dLnKappaDLnRho, "dlnk/dlnrho", s);
                finite(out.dLnKappaDLnT, "dlnk/dlnT", s);
                assertNotNull(out.status);
            } catch (TransportException e) {
                refused(call, e);
            }
        }
        ThermoResult th = new ThermoResult();
        try {
            IdealGasRadiation.INSTANCE.evaluate(s.temperature, s.density, s.hydrogen, s.metals, s.zone, th);
            Statistics.label("thermodynamics").collect("accepted");
            for (double v : new double[] {th.mu, th.beta, th.pressure, th.nablaAd, th.cp, th.delta, th.phi, th.gamma1}) {
                finite(v, "a thermodynamic output", s);
            }
            // beta = P_gas / P is in (0, 1]; for a fully ionised ideal gas plus radiation nabla_ad runs from 2/5
            // (beta = 1) down to 1/4 (beta -> 0) and Gamma_1 from 5/3 to 4/3 (Chandrasekhar 1939; Kippenhahn,
            // Weigert & Weiss 2012 ch. 13, from memory); the slack is rounding
            assertTrue(th.pressure > 0.0 && th.cp > 0.0 && th.beta > 0.0 && th.beta <= 1.0
                    && th.nablaAd >= 0.25 - 1e-12 && th.nablaAd <= 0.4 + 1e-12
                    && th.gamma1 >= 4.0 / 3.0 - 1e-12 && th.gamma1 <= 5.0 / 3.0 + 1e-12, "ranges " + th + " for " + s);
        } catch (TransportException e) {
            refused("thermodynamics", e);
        }
    }

    /** The batch call over a column of garbage zones: refused naming a zone in range, or all finite. */
    @Tag("internal")
    @Property(tries = 200, seed = "7102")
    void batchCallsGiveFiniteColumnsOrOurException(@ForAll("extreme") double a, @ForAll("extreme") double b,
                                                   @ForAll @IntRange(min = 0, max = 11) int field,
                                                   @ForAll @IntRange(min = 0, max = 63) int at) {
        ZoneColumns in = BatchColumns.demo();
        int n = in.capacity;
        int k = at * (n - 1) / 63;
        double[][] fields = {in.temperature, in.density, in.pressure, in.luminosity, in.mass, in.radius, in.opacity,
            in.cp, in.nablaAd, in.delta, in.nablaMu, in.hydrogen};
        fields[field][k] = a;
        in.luminosity[(k + 1) % n] *= Double.isFinite(b) ? 1.0 + Math.abs(b) % 10.0 : 1.0;
        ConvectionColumns out = new ConvectionColumns(n);
        Statistics.coverage(c -> {
            c.check("accepted").percentage(q -> q >= 10.0);
            c.check("refused").percentage(q -> q >= 10.0);
        });
        try {
            new LocalMixingLength().solveColumns(in, 0, n, out, true);
            Statistics.collect("accepted");
            for (int j = 0; j < n; j++) {
                finite(out.nabla[j], "nabla", "zone " + j);
                for (int i = 0; i < ZoneInput.COUNT; i++) {
                    finite(out.dNabla[i][j], "dnabla", "zone " + j);
                    finite(out.dDiffusion[i][j], "dD", "zone " + j);
                }
            }
        } catch (io.github.startransport.spi.InvalidInputException e) {
            Statistics.collect("refused");
            assertTrue(e.zone() == k, "refusal names zone " + e.zone() + ", the garbage is in zone " + k);
        }
    }

    /** Whole-profile diagnosis of the demo star with one column spoiled: a finite diagnosis or our exception. */
    @Tag("internal")
    @Property(tries = 150, seed = "7103")
    void diagnosisGivesFiniteColumnsOrOurException(@ForAll("extreme") double a,
                                                   @ForAll @IntRange(min = 0, max = 7) int column,
                                                   @ForAll @IntRange(min = 0, max = 199) int at,
                                                   @ForAll @IntRange(min = 1, max = 5) int count) {
        Profile demo = new DemoStar(200).profile();
        Map<ProfileColumn, double[]> cols = new EnumMap<>(ProfileColumn.class);
        for (ProfileColumn c : ProfileColumn.values()) {
            if (demo.has(c)) {
                cols.put(c, demo.column(c));
            }
        }
        ProfileColumn spoiled = ProfileColumn.values()[column % ProfileColumn.values().length];
        double[] v = cols.get(spoiled);
        if (v != null) {
            for (int j = 0; j < count; j++) {
                v[(at + 17 * j) % v.length] *= a;
            }
        }
        DiagnosisSetup setup = new DiagnosisSetup(new LocalMixingLength(), AnalyticOpacity.DEFAULT,
                IdealGasRadiation.INSTANCE);
        Statistics.coverage(c -> {
            c.check("accepted").percentage(q -> q >= 10.0);
            c.check("refused").percentage(q -> q >= 10.0);
        });
        try {
            ProfileDiagnosis d = LocalDiagnosis.INSTANCE.diagnose(new Profile("spoiled demo", cols), setup);
            Statistics.collect("accepted");
            for (DiagnosisColumn c : DiagnosisColumn.values()) {
                for (double x : d.column(c)) {
                    finite(x, c.header(), spoiled);
                }
            }
        } catch (TransportException e) {
            Statistics.collect("refused");
            assertTrue(e.getMessage() != null && !e.getMessage().isBlank());
        }
    }
}
