package io.github.startransport.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Small profile files for reader and command tests. The numbers are invented, not a stellar model. */
final class ProfileFiles {
    static final String HEADER = "r_cm,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z";

    /** Five valid rows, centre to surface, in the column order of {@link #HEADER}. */
    static final String[] ROWS = {
        "1.0e9,1.0e31,1.5e7,150,2.0e17,1.0e32,0.7,0.02",
        "5.0e9,5.0e32,1.2e7,80,9.0e16,1.0e33,0.7,0.02",
        "2.0e10,1.2e33,6.0e6,5,3.0e15,3.5e33,0.7,0.02",
        "5.0e10,1.9e33,1.0e6,0.1,1.0e13,3.8e33,0.7,0.02",
        "6.9e10,2.0e33,1.0e4,1e-6,1.0e6,3.8e33,0.7,0.02",
    };

    private ProfileFiles() {
    }

    static Path write(Path dir, String name, String... lines) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, String.join("\n", lines) + "\n", StandardCharsets.UTF_8);
        return file;
    }

    /** @return the valid profile with a comment line before the header (data rows on lines 3-7) */
    static Path valid(Path dir, String name) throws IOException {
        String[] lines = new String[ROWS.length + 2];
        lines[0] = "# invented numbers for testing";
        lines[1] = HEADER;
        System.arraycopy(ROWS, 0, lines, 2, ROWS.length);
        return write(dir, name, lines);
    }
}
