package io.github.startransport.core.model;

import io.github.startransport.core.convection.LocalMixingLength;
import io.github.startransport.core.envelope.GreyAtmosphereEnvelope;
import io.github.startransport.core.CoreProvider;
import io.github.startransport.core.opacity.AnalyticOpacity;
import io.github.startransport.spi.EnvelopeSetup;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.EnvelopeSolution;
import io.github.startransport.spi.EnvelopeStar;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The demo star with a real surface: the polytropic interior of an {@link EddingtonStandardModel}
 * joined to an envelope integrated inward from a grey atmosphere ({@link GreyAtmosphereEnvelope})
 * for the same M, R, L and composition, so that the outermost zone is the photosphere (T = T_eff
 * of L and R) and the surface convection zone is the one the library's own physics gives.
 *
 * <p>Construction (demo data, not a solution of the full structure equations): below
 * r = {@value #JOIN_LOW} R the polytrope's zones; from there out the envelope's points (spacing
 * in ln P chosen so that the envelope holds about half the zones). Between {@value #JOIN_LOW} R and
 * {@value #JOIN_HIGH} R ln T, ln rho and ln P go smoothly (a cubic smoothstep in r) from the
 * polytrope's values to the envelope's; there the two differ by a few per cent to ~15 % for the
 * demo star, so the join leaves no step. m above the join is the polytrope's m there plus the
 * envelope's own mass increments scaled so that the outermost zone holds M (the two models put
 * different masses above 0.75 R, ~0.5 % of M). L is the polytrope's below the outer end of the join
 * and the surface L above it (the envelope holds L constant).
 */
final class DemoSurface {
    /** Inner end of the join and the stated depth of the envelope integration (r / R). */
    static final double JOIN_LOW = 0.75;
    /** Outer end of the join (r / R). */
    static final double JOIN_HIGH = 0.85;

    private DemoSurface() {
    }

    /**
     * @return the models the demo envelope is integrated with: the core provider's default of each family
     *         (the thermodynamics default is the one the diagnosis falls back on)
     */
    static EnvelopeSetup models() {
        CoreProvider core = new CoreProvider();
        return new EnvelopeSetup(new LocalMixingLength(), AnalyticOpacity.DEFAULT,
                core.create(ModelFamily.THERMODYNAMICS, core.defaultModel(ModelFamily.THERMODYNAMICS),
                        ModelOptions.defaults()));
    }

    /**
     * @param model  the interior
     * @param source name of the profile
     * @param zones  about how many zones in all, &gt;= 10
     * @return the joined profile, centre to surface
     */
    static Profile profile(EddingtonStandardModel model, String source, int zones) {
        double radius = model.radius();
        EnvelopeStar star = new EnvelopeStar(model.mass(), radius, model.luminosity(), model.hydrogen(),
                model.metals());
        double spacing = Math.max(1e-3, Math.min(1.0, 40.0 / zones));
        GreyAtmosphereEnvelope integrator = new GreyAtmosphereEnvelope(GreyAtmosphereEnvelope.DEFAULT_TOLERANCE,
                JOIN_LOW, GreyAtmosphereEnvelope.DEFAULT_TOP_OPTICAL_DEPTH, spacing,
                GreyAtmosphereEnvelope.DEFAULT_SUPERADIABATIC_THRESHOLD, GreyAtmosphereEnvelope.DEFAULT_ALPHA_LOW,
                GreyAtmosphereEnvelope.DEFAULT_ALPHA_HIGH);
        EnvelopeSolution solution = integrator.integrate(star, models());
        Profile envelope = solution.profile().orElseThrow();
        Profile interior = model.profile(source, zones, 1e4);

        List<double[]> rows = new ArrayList<>(); // r, m, T, rho, P, L
        double joinRadius = envelope.value(ProfileColumn.RADIUS, 0);
        for (int k = 0; k < interior.size(); k++) {
            double r = interior.value(ProfileColumn.RADIUS, k);
            if (r >= joinRadius) {
                break;
            }
            rows.add(new double[] {r, interior.value(ProfileColumn.MASS, k),
                interior.value(ProfileColumn.TEMPERATURE, k), interior.value(ProfileColumn.DENSITY, k),
                interior.value(ProfileColumn.PRESSURE, k), interior.value(ProfileColumn.LUMINOSITY, k)});
        }
        double[] poly = new double[5];
        model.state(joinRadius, poly);
        double massAtJoin = poly[3];
        double envelopeMassAtJoin = envelope.value(ProfileColumn.MASS, 0);
        for (int k = 0; k < envelope.size(); k++) {
            double r = envelope.value(ProfileColumn.RADIUS, k);
            double x = (r / radius - JOIN_LOW) / (JOIN_HIGH - JOIN_LOW);
            double w = x <= 0.0 ? 0.0 : x >= 1.0 ? 1.0 : x * x * (3.0 - 2.0 * x);
            double m = massAtJoin + (model.mass() - massAtJoin)
                    * ((envelope.value(ProfileColumn.MASS, k) - envelopeMassAtJoin) / (model.mass() - envelopeMassAtJoin));
            double t = envelope.value(ProfileColumn.TEMPERATURE, k);
            double rho = envelope.value(ProfileColumn.DENSITY, k);
            double p = envelope.value(ProfileColumn.PRESSURE, k);
            double l = model.luminosity();
            if (w < 1.0) {
                model.state(r, poly);
                t = Math.exp((1.0 - w) * Math.log(poly[0]) + w * Math.log(t));
                rho = Math.exp((1.0 - w) * Math.log(poly[1]) + w * Math.log(rho));
                p = Math.exp((1.0 - w) * Math.log(poly[2]) + w * Math.log(p));
                l = poly[4];
            }
            rows.add(new double[] {r, m, t, rho, p, l});
        }
        int n = rows.size();
        Map<ProfileColumn, double[]> cols = new EnumMap<>(ProfileColumn.class);
        ProfileColumn[] order = {ProfileColumn.RADIUS, ProfileColumn.MASS, ProfileColumn.TEMPERATURE,
            ProfileColumn.DENSITY, ProfileColumn.PRESSURE, ProfileColumn.LUMINOSITY};
        for (int j = 0; j < order.length; j++) {
            double[] v = new double[n];
            for (int k = 0; k < n; k++) {
                v[k] = rows.get(k)[j];
            }
            cols.put(order[j], v);
        }
        double[] x = new double[n];
        double[] z = new double[n];
        java.util.Arrays.fill(x, model.hydrogen());
        java.util.Arrays.fill(z, model.metals());
        cols.put(ProfileColumn.HYDROGEN, x);
        cols.put(ProfileColumn.METALS, z);
        return new Profile(source, cols);
    }
}
