package io.github.startransport.cli;

import io.github.startransport.core.model.DemoStar;
import io.github.startransport.spi.Profile;
import io.github.startransport.spi.ProfileColumn;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Large profile files for the measurements: the demo star of 100,000 zones (its largest)
 * resampled to any number of zones by linear interpolation in zone index, written with the eight required columns (what most programs export), each number as
 * {@link Double#toString} writes it (up to 17 significant digits, about 150 bytes a row).
 */
final class LargeProfiles {
    private static final ProfileColumn[] COLUMNS = {ProfileColumn.RADIUS, ProfileColumn.MASS,
        ProfileColumn.TEMPERATURE, ProfileColumn.DENSITY, ProfileColumn.PRESSURE, ProfileColumn.LUMINOSITY,
        ProfileColumn.HYDROGEN, ProfileColumn.METALS};

    private LargeProfiles() {
    }

    /**
     * @param file  where to write
     * @param zones how many zones
     * @return the file
     * @throws IOException when it cannot be written
     */
    static Path write(Path file, int zones) throws IOException {
        Profile p = new DemoStar(100_000).profile();
        int n0 = p.size();
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            StringBuilder b = new StringBuilder();
            for (ProfileColumn c : COLUMNS) {
                b.append(b.length() == 0 ? "" : ",").append(c.header());
            }
            w.write(b.append('\n').toString());
            double lastR = 0;
            double lastM = 0;
            for (int k = 0; k < zones; k++) {
                b.setLength(0);
                double at = (double) k * (n0 - 1) / (zones - 1);
                int i = Math.min((int) at, n0 - 2);
                double f = at - i;
                for (ProfileColumn c : COLUMNS) {
                    double v = k == zones - 1 ? p.value(c, n0 - 1) : (1 - f) * p.value(c, i) + f * p.value(c, i + 1);
                    // r and m must increase strictly; near the surface m changes by less than its last bit
                    if (c == ProfileColumn.RADIUS) {
                        v = lastR = Math.max(v, Math.nextUp(lastR));
                    } else if (c == ProfileColumn.MASS) {
                        v = lastM = Math.max(v, Math.nextUp(lastM));
                    }
                    b.append(b.length() == 0 ? "" : ",").append(v);
                }
                w.write(b.append('\n').toString());
            }
        }
        return file;
    }

    /**
     * Writes a profile file: {@code LargeProfiles FILE ZONES}.
     *
     * @param args file and zone count
     * @throws IOException when it cannot be written
     */
    public static void main(String[] args) throws IOException {
        write(Path.of(args[0]), Integer.parseInt(args[1]));
    }
}
