package io.github.startransport.bridge;

import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneColumns;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * The files the example hosts and the native benchmark share with their Java counterparts:
 * {@code models.txt} (family, name and options of the four models, one model per line, separated by
 * spaces) and
 * {@code profile.csv} (the host's zones), both written here and read by the C and Fortran hosts.
 *
 * <p>The profile is demo data: the demo star's zones (through the SPI's star model) with an
 * invented composition gradient nabla_mu (uniform in [-0.05, 0.3], seeded) so that all four
 * regimes occur under the Ledoux criterion. Numbers are written with {@link Double#toString},
 * which reads back to the same double in Java, C ({@code strtod}) and Fortran.
 */
final class ExampleData {
    private ExampleData() {
    }

    /** The models every example and the benchmark use: family, name, options. */
    static final String[][] MODELS = {
        {"thermodynamics", "ideal-gas-radiation", ""},
        {"opacity", "analytic-composite", ""},
        {"stability", "gradient-comparison", "criterion=ledoux"},
        {"convection", "local-mixing-length", "alpha=1.8,criterion=ledoux"},
    };

    /** Header of profile.csv. */
    static final String PROFILE_HEADER = "r_cm,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z,nabla_mu";

    static void writeModels(Path file) throws IOException {
        StringBuilder b = new StringBuilder();
        for (String[] m : MODELS) {
            b.append(m[0]).append(' ').append(m[1]).append(' ').append(m[2]).append('\n');
        }
        Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
    }

    /**
     * Writes the demo star's zones with an invented nabla_mu.
     *
     * @param file   profile.csv
     * @param points zones asked of the demo star (it gives about that many)
     * @param limit  at most this many zones are written (the innermost)
     * @return the number of zones written
     */
    static int writeProfile(Transport transport, Path file, int points, int limit) throws IOException {
        Profile p = transport.star("corvina", ModelOptions.parse("zones=" + points)).profile();
        SplittableRandom random = new SplittableRandom(11);
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(PROFILE_HEADER);
            w.write('\n');
            ProfileColumn[] columns = {ProfileColumn.RADIUS, ProfileColumn.MASS, ProfileColumn.TEMPERATURE,
                ProfileColumn.DENSITY, ProfileColumn.PRESSURE, ProfileColumn.LUMINOSITY, ProfileColumn.HYDROGEN,
                ProfileColumn.METALS};
            for (int k = 0; k < Math.min(p.size(), limit); k++) {
                StringBuilder row = new StringBuilder();
                for (ProfileColumn c : columns) {
                    row.append(p.value(c, k)).append(',');
                }
                row.append(random.nextDouble(-0.05, 0.3)).append('\n');
                w.write(row.toString());
            }
        }
        return Math.min(p.size(), limit);
    }

    /** Reads profile.csv into columns (radius, mass, T, rho, P, L, X, Z, nabla_mu; phi = 1). */
    static ZoneColumns readProfile(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        if (lines.isEmpty() || !lines.get(0).equals(PROFILE_HEADER)) {
            throw new IOException(file + ": expected the header " + PROFILE_HEADER);
        }
        List<double[]> rows = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            if (lines.get(i).isBlank()) {
                continue;
            }
            String[] f = lines.get(i).split(",");
            double[] row = new double[9];
            for (int j = 0; j < 9; j++) {
                row[j] = Double.parseDouble(f[j]);
            }
            rows.add(row);
        }
        ZoneColumns in = new ZoneColumns(rows.size());
        for (int k = 0; k < rows.size(); k++) {
            double[] r = rows.get(k);
            in.radius[k] = r[0];
            in.mass[k] = r[1];
            in.temperature[k] = r[2];
            in.density[k] = r[3];
            in.pressure[k] = r[4];
            in.luminosity[k] = r[5];
            in.hydrogen[k] = r[6];
            in.metals[k] = r[7];
            in.nablaMu[k] = r[8];
        }
        return in;
    }

    /**
     * Completes the zones as the example hosts do: c_P, nabla_ad, delta and phi from the
     * thermodynamics model (zone by zone, as the bridge does), kappa from the opacity model's
     * batch call.
     *
     * @param thermoOut receives the thermodynamics of every zone (8 columns), or null
     * @param opacityOut receives the opacity columns, or null
     */
    static void complete(ZoneColumns in, ThermodynamicsModel thermo, OpacityModel opacity, double[][] thermoOut,
                         OpacityColumns opacityOut) {
        int n = in.capacity;
        ThermoResult r = new ThermoResult();
        for (int k = 0; k < n; k++) {
            thermo.evaluate(in.temperature[k], in.density[k], in.hydrogen[k], in.metals[k], k, r);
            in.cp[k] = r.cp;
            in.nablaAd[k] = r.nablaAd;
            in.delta[k] = r.delta;
            in.phi[k] = r.phi;
            if (thermoOut != null) {
                double[] v = {r.mu, r.beta, r.pressure, r.nablaAd, r.cp, r.delta, r.phi, r.gamma1};
                for (int j = 0; j < v.length; j++) {
                    thermoOut[j][k] = v[j];
                }
            }
        }
        OpacityColumns kappa = opacityOut != null ? opacityOut : new OpacityColumns(n);
        opacity.evaluateColumns(in, 0, n, kappa);
        System.arraycopy(kappa.kappa, 0, in.opacity, 0, n);
    }

    /** @return the model of family i of {@link #MODELS} */
    static Object model(Transport transport, int i) {
        String options = MODELS[i][2];
        return transport.model(io.github.startransport.spi.ModelFamily.byName(MODELS[i][0]), MODELS[i][1],
                options.isEmpty() ? ModelOptions.defaults() : ModelOptions.parse(options));
    }
}
