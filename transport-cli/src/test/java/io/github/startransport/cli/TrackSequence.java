package io.github.startransport.cli;

import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;
import io.github.startransport.spi.Transport;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * An invented evolution sequence for testing {@code track}: the library's demo star (Eddington's
 * standard model with an integrated envelope) with its core hydrogen lowered step by step, as if
 * burnt. Only X changes: in each profile X is X_c inside a mixed core that recedes with age, rises
 * linearly to the initial X across the layers the core has left (a stabilising composition
 * gradient), and is the initial X above; and a shell around m/M = 0.5 has its X lowered a little
 * more with age (mean molecular weight rising outwards on its inner side: an inverted gradient).
 * T, rho, P and L are the demo star's; the profiles are therefore not solutions of the structure
 * equations, only inputs of known composition.
 */
final class TrackSequence {
    /** Age of the last profile (yr). */
    static final double LAST_AGE = 3e9;
    /** Mass fraction of the demo star's convective core top (m/M = 0.3404 in the README's demo output). */
    static final double CORE = 0.34;

    private TrackSequence() {
    }

    /** @return X at mass fraction q of profile i of n */
    static double hydrogen(double x0, double q, int i, int n) {
        double t = n == 1 ? 0 : (double) i / (n - 1);
        double xc = x0 - 0.6 * t;
        double mixed = CORE * (1 - 0.7 * Math.sqrt(t)); // receding so that X at any m falls with age
        double dip = 0.05 * t * Math.exp(-Math.pow((q - 0.5) / 0.03, 2));
        if (q <= mixed) {
            return xc - dip;
        }
        return (q >= CORE ? x0 : xc + (x0 - xc) * (q - mixed) / (CORE - mixed)) - dip;
    }

    /** @return the age of profile i of n (yr) */
    static double age(int i, int n) {
        return n == 1 ? 0 : LAST_AGE * i / (n - 1);
    }

    /**
     * @param dir     where to write
     * @param n       how many profiles
     * @param comment whether each file states its age and model number in comment lines
     * @return the files, youngest first
     */
    static List<Path> write(Path dir, int n, boolean comment) throws IOException {
        Profile p = Transport.discover().star(null, ModelOptions.defaults()).profile();
        ProfileColumn[] columns = {ProfileColumn.RADIUS, ProfileColumn.MASS, ProfileColumn.TEMPERATURE,
            ProfileColumn.DENSITY, ProfileColumn.PRESSURE, ProfileColumn.LUMINOSITY, ProfileColumn.HYDROGEN,
            ProfileColumn.METALS};
        double mass = p.mass();
        List<Path> files = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            StringBuilder b = new StringBuilder("# invented: the demo star with its core hydrogen lowered\n");
            if (comment) {
                b.append("# age_yr = ").append(age(i, n)).append('\n');
                b.append("# model_number = ").append(100 * (i + 1)).append('\n');
            }
            StringBuilder header = new StringBuilder();
            for (ProfileColumn c : columns) {
                header.append(header.length() == 0 ? "" : ",").append(c.header());
            }
            b.append(header).append('\n');
            for (int k = 0; k < p.size(); k++) {
                for (int j = 0; j < columns.length; j++) {
                    double v = columns[j] == ProfileColumn.HYDROGEN
                            ? hydrogen(p.value(ProfileColumn.HYDROGEN, k), p.value(ProfileColumn.MASS, k) / mass, i, n)
                            : p.value(columns[j], k);
                    b.append(j == 0 ? "" : ",").append(v);
                }
                b.append('\n');
            }
            files.add(Files.writeString(dir.resolve(String.format("star-%02d.csv", i + 1)), b.toString()));
        }
        return files;
    }
}
