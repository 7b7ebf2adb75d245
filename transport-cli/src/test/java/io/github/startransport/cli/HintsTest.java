package io.github.startransport.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Every hint the tool prints must work when copied: each test runs the tool on a file another
 * program might write, takes the hint out of the message exactly as printed, and runs the tool
 * again with it. The second run must succeed.
 */
class HintsTest {
    private static final Pattern RERUN = Pattern.compile("rerun with (--[a-z-]+) (\\S+?)(?=[ ;.)]|$)");

    /** The option and value a message tells to rerun with. */
    private static String[] hint(Runs r) {
        Matcher m = RERUN.matcher(r.err());
        assertTrue(m.find(), "no 'rerun with' hint in:\n" + r.err());
        String value = m.group(2);
        if (value.startsWith("'") && value.endsWith("'")) {
            value = value.substring(1, value.length() - 1); // as a shell would
        }
        return new String[] {m.group(1), value};
    }

    /** Runs with the given arguments, then again with the hint appended: the second run must succeed. */
    private static Runs copyHint(Path out, String... args) {
        List<String> first = new ArrayList<>(List.of(args));
        first.addAll(List.of("--out", out.toString()));
        Runs r = Runs.run(first.toArray(new String[0]));
        assertEquals(1, r.code(), r.toString());
        String[] hint = hint(r);
        List<String> second = new ArrayList<>(first);
        int given = second.indexOf(hint[0]);
        if (given >= 0) { // the hint replaces the option's earlier value
            second.remove(given + 1);
            second.remove(given);
        }
        second.addAll(List.of(hint));
        Runs again = Runs.run(second.toArray(new String[0]));
        assertEquals(0, again.code(), "the hint " + String.join(" ", hint) + " did not work:\n" + r + "\nthen\n"
                + again);
        return r;
    }

    private static Path file(Path dir, String name, String header, String separator) throws IOException {
        List<String> lines = new ArrayList<>(List.of("# written by another program", header));
        for (String row : ProfileFiles.ROWS) {
            lines.add(row.replace(",", separator));
        }
        return ProfileFiles.write(dir, name, lines.toArray(new String[0]));
    }

    @Test
    void theMissingColumnHintReadsTheFilesNameEqualsOursAndWorks(@TempDir Path dir) throws IOException {
        // the issue: the hint said --columns r_cm=radius, reversed
        Path p = file(dir, "p.csv", "rad,Mass,Temp,Dens,Press,Lum,X,Z", ",");
        Runs r = copyHint(dir.resolve("out"), "diagnose", p.toString());
        assertTrue(r.err().contains("--columns rad=r_cm,Temp=T_K,Dens=rho_g_cm3,Press=P_dyn_cm2,Lum=L_erg_s"),
                r.err());
    }

    @Test
    void aColumnsMapThatMissesOnlyByCaseIsCorrected(@TempDir Path dir) throws IOException {
        Path p = file(dir, "p.csv", "r_cm,m_g,Temp,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z", ",");
        copyHint(dir.resolve("out"), "diagnose", p.toString(), "--columns", "temp=T_K");
    }

    @Test
    void twoNamesForOneColumnAreRefusedWithAChoice(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.write(dir, "p.csv", "r,radius,m_g,T_K,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z",
                "1e9,1e9,1e31,1.5e7,150,2e17,1e32,0.7,0.02", "5e9,5e9,5e32,1.2e7,80,9e16,1e33,0.7,0.02",
                "2e10,2e10,1.2e33,6e6,5,3e15,3.5e33,0.7,0.02", "5e10,5e10,1.9e33,1e6,0.1,1e13,3.8e33,0.7,0.02");
        Runs r = copyHint(dir.resolve("out"), "diagnose", p.toString());
        assertTrue(r.err().contains("'r' (column 1) and 'radius' (column 2) both name r_cm"), r.err());
    }

    @Test
    void aSemicolonATabOrSpacesBetweenCellsAreRecognisedInTheHint(@TempDir Path dir) throws IOException {
        String header = ProfileFiles.HEADER;
        copyHint(dir.resolve("a"), "diagnose", file(dir, "semi.csv", header.replace(",", ";"), ";").toString());
        copyHint(dir.resolve("b"), "diagnose", file(dir, "tab.csv", header.replace(",", "\t"), "\t").toString());
        Runs r = copyHint(dir.resolve("c"), "diagnose", file(dir, "fixed.txt", header.replace(",", "   "), "   ")
                .toString());
        assertTrue(r.err().contains("--delimiter whitespace"), r.err());
    }

    @Test
    void aReversedColumnsItemIsAUsageErrorThatSaysHowToWriteIt(@TempDir Path dir) throws IOException {
        Path p = file(dir, "p.csv", "r_cm,m_g,Temp,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z", ",");
        Runs r = Runs.run("diagnose", p.toString(), "--columns", "T_K=Temp", "--out", dir.resolve("out").toString());
        assertEquals(2, r.code(), r.toString());
        Matcher m = Pattern.compile("write (\\S+=\\S+), not").matcher(r.err());
        assertTrue(m.find(), r.err());
        Runs again = Runs.run("diagnose", p.toString(), "--columns", m.group(1), "--out",
                dir.resolve("out").toString());
        assertEquals(0, again.code(), again.toString());
    }

    @Test
    void aFortranNumberThatLostItsExponentLetterIsShownWrittenRight(@TempDir Path dir) throws IOException {
        String[] rows = ProfileFiles.ROWS.clone();
        rows[4] = rows[4].replace("1e-6", "0.1-005");
        Path p = ProfileFiles.write(dir, "p.csv", ProfileFiles.HEADER, rows[0], rows[1], rows[2], rows[3], rows[4]);
        Runs r = Runs.run("diagnose", p.toString(), "--out", dir.resolve("out").toString());
        assertEquals(1, r.code(), r.toString());
        Matcher m = Pattern.compile("write (\\S+)\\)").matcher(r.err());
        assertTrue(m.find(), r.err());
        Files.writeString(p, Files.readString(p).replace("0.1-005", m.group(1)));
        assertEquals(0, Runs.run("diagnose", p.toString(), "--out", dir.resolve("out").toString()).code());
    }

    @Test
    void columnsInLogarithmsOrSolarUnitsAreNamedButNotOfferedToTheMap(@TempDir Path dir) throws IOException {
        Path p = file(dir, "p.csv", "r_cm,mass_Msun,logT,rho_g_cm3,P_dyn_cm2,L_erg_s,X,Z", ",");
        Runs r = Runs.run("diagnose", p.toString(), "--out", dir.resolve("out").toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains("'logT' looks like the logarithm of T_K"), r.err());
        assertTrue(r.err().contains("'mass_Msun' looks like m_g in solar units"), r.err());
        assertFalse(r.err().contains("rerun with"), r.err());
    }
}
