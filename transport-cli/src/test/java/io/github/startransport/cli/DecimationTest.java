package io.github.startransport.cli;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The plots' decimated series keep every extreme and every gap, in a bounded number of points. */
class DecimationTest {

    @Test
    void aSmallSeriesIsDrawnWhole() {
        int[] k = DiagnosisCharts.decimate(DiagnosisCharts.MAX_POINTS, i -> i, i -> 1.0 + i);
        assertEquals(DiagnosisCharts.MAX_POINTS, k.length);
        for (int i = 0; i < k.length; i++) {
            assertEquals(i, k[i]);
        }
    }

    @Test
    void aMillionZonesGiveAFewThousandPointsWithTheSpikesTheDipAndTheGapKept() {
        int n = 1_000_000;
        int spike = 123_457;
        int dip = 765_431;
        int gap = 500_001;
        DiagnosisCharts.Values x = i -> i / (double) n;
        DiagnosisCharts.Values y = i -> i == spike ? 1e9 : i == dip ? 1e-9 : i == gap ? 0.0
                : 1.0 + 0.5 * Math.sin(i * 1e-3);
        int[] k = DiagnosisCharts.decimate(n, x, y);
        assertTrue(k.length <= 5 * DiagnosisCharts.RUNS, "points: " + k.length);
        assertTrue(k.length >= 2 * DiagnosisCharts.RUNS, "points: " + k.length);
        boolean sawSpike = false;
        boolean sawDip = false;
        boolean sawGap = false;
        for (int i = 0; i < k.length; i++) {
            if (i > 0) {
                assertTrue(k[i] > k[i - 1], "not increasing at " + i);
            }
            sawSpike |= k[i] == spike;
            sawDip |= k[i] == dip;
            sawGap |= k[i] == gap;
        }
        assertTrue(sawSpike && sawDip && sawGap, "spike " + sawSpike + ", dip " + sawDip + ", gap " + sawGap);
        assertEquals(0, k[0]);
        assertEquals(n - 1, k[k.length - 1]);
    }
}
