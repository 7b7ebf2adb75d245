package io.github.startransport.cli;

import io.github.startransport.spi.ProfileDiagnosis;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.Region;
import io.github.startransport.spi.Timescales;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The few lines printed on standard output after a diagnosis: the star, the models, the
 * regions and the timescales.
 */
final class HumanSummary {
    /** Nominal solar radius R_sun (cm), IAU 2015 Resolution B3 (exact by definition). */
    static final double SOLAR_RADIUS_CM = 6.957e10;
    /** Nominal solar luminosity L_sun (erg s^-1), IAU 2015 Resolution B3 (exact by definition). */
    static final double SOLAR_LUMINOSITY_ERG_S = 3.828e33;
    /**
     * Solar mass (g): the IAU 2015 B3 nominal (GM)_sun = 1.3271244e26 cm^3 s^-2 divided by the
     * CODATA 2018 G = 6.67430e-8 cm^3 g^-1 s^-2. For display only.
     */
    static final double SOLAR_MASS_G = 1.3271244e26 / 6.67430e-8;

    private HumanSummary() {
    }

    /**
     * @param d      the diagnosis
     * @param models the models it was made with
     * @param where  the folder its files went to
     * @return the summary, lines separated by {@code \n}, ending with one
     */
    static String text(ProfileDiagnosis d, ModelsUsed models, String where) {
        StringBuilder b = new StringBuilder();
        b.append(d.source()).append(": ").append(d.size()).append(" zones\n");
        b.append(String.format(Locale.ROOT, "  M = %.4g g (%.4g M_sun)   R = %.4g cm (%.4g R_sun)   L = %.4g erg/s"
                        + " (%.4g L_sun)\n", d.mass(), d.mass() / SOLAR_MASS_G, d.radius(), d.radius() / SOLAR_RADIUS_CM,
                d.luminosity(), d.luminosity() / SOLAR_LUMINOSITY_ERG_S));
        b.append("  criterion ").append(d.criterion().label()).append(", alpha = ").append(d.alpha())
                .append(", convection ").append(models.convection()).append(", opacity ").append(models.opacity())
                .append(models.opacityTable() == null ? "" : " (" + models.opacityTable() + ")").append('\n');
        if (d.regions().isEmpty()) {
            b.append("  regions: none; every zone is radiative\n");
        } else {
            b.append("  regions, centre to surface:\n");
            for (Region r : d.regions()) {
                b.append(String.format(Locale.ROOT, "    %-15s r/R %.4f - %.4f   m/M %.6f - %.6f", r.regime().label(),
                        r.bottomRadiusFraction(), r.topRadiusFraction(), r.bottomMassFraction(), r.topMassFraction()));
                if (r.regime() == Regime.CONVECTIVE) {
                    b.append("   turnover ").append(days(r.turnoverGlobal())).append(" (global), ")
                            .append(days(r.turnoverLocal())).append(" (local), max v_conv ")
                            .append(r.maxVelocity().isPresent()
                                    ? String.format(Locale.ROOT, "%.3g cm/s", r.maxVelocity().getAsDouble()) : "n/a");
                    if (r.overshootBottom().isPresent() || r.overshootTop().isPresent()) {
                        b.append("   overshoot to r/R ").append(fraction(r.overshootBottom(), d.radius()))
                                .append(" below, ").append(fraction(r.overshootTop(), d.radius())).append(" above");
                    }
                }
                b.append('\n');
            }
        }
        Timescales t = d.timescales();
        b.append("  timescales: photon diffusion ").append(years(t.photonDiffusion())).append(", thermal diffusion ")
                .append(years(t.thermalDiffusion())).append(", Kelvin-Helmholtz ").append(years(t.kelvinHelmholtz()))
                .append('\n');
        d.seismic().ifPresent(s -> b.append(String.format(Locale.ROOT, "  seismic: acoustic radius %.4g s,"
                + " large separation %.4g uHz, l = 1 period spacing %s\n", s.acousticRadius(),
                s.largeSeparation() * 1e6, Double.isFinite(s.periodSpacingL1())
                        ? String.format(Locale.ROOT, "%.4g s", s.periodSpacingL1()) : "n/a (no zone with N^2 > 0)")));
        for (String w : d.warnings()) {
            b.append("  warning: ").append(w).append('\n');
        }
        b.append("  written to ").append(where).append('\n');
        return b.toString();
    }

    /** A time in years, or "n/a" where it is undefined (as null in summary.json): never negative or infinite. */
    static String years(double seconds) {
        return seconds > 0 && Double.isFinite(seconds)
                ? String.format(Locale.ROOT, "%.3g yr", seconds / SummaryJson.JULIAN_YEAR_S) : "n/a";
    }

    private static String fraction(OptionalDouble r, double radius) {
        return r.isPresent() ? String.format(Locale.ROOT, "%.4f", r.getAsDouble() / radius) : "-";
    }

    private static String days(OptionalDouble seconds) {
        return seconds.isPresent() ? String.format(Locale.ROOT, "%.3g d", seconds.getAsDouble() / SummaryJson.DAY_S)
                : "n/a";
    }
}
