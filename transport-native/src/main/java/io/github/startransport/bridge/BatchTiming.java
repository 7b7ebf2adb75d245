package io.github.startransport.bridge;

import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneMajorJacobian;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.DoubleBuffer;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * The Java side of the native benchmark (run-benchmark.sh): times the same batch that
 * bench_convection.c sends through the C interface, on the same zones, called from Java: convection
 * with the zone-major Jacobian ({@link ConvectionModel#solveZoneMajor}) over the whole profile, and,
 * for comparison, the same into a direct buffer as the bridge does ({@code solveZoneMajorInto}) and the
 * column layout ({@code solveColumns}). Same warm-up and rounds as the C side;
 * prints the median and the fastest round in ns per zone. A timing tool, not a test.
 *
 * <p>Usage: {@code java -cp <jars> io.github.startransport.bridge.BatchTiming DIR [WARMUP_SECONDS ROUNDS CALLS]}
 */
public final class BatchTiming {
    private BatchTiming() {
    }

    private static double sink;

    /**
     * @param args directory of models.txt and profile.csv, then optionally warm-up seconds, rounds, calls per round
     * @throws IOException when the profile cannot be read
     */
    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args[0]);
        double warmup = args.length > 1 ? Double.parseDouble(args[1]) : 5.0;
        int rounds = args.length > 2 ? Integer.parseInt(args[2]) : 31;
        int calls = args.length > 3 ? Integer.parseInt(args[3]) : 200;
        Transport transport = Transport.discover();
        ZoneColumns in = ExampleData.readProfile(dir.resolve("profile.csv"));
        ExampleData.complete(in, (ThermodynamicsModel) ExampleData.model(transport, 0),
                (OpacityModel) ExampleData.model(transport, 1), null, null);
        ConvectionModel convection = (ConvectionModel) ExampleData.model(transport, 3);
        int n = in.capacity;
        ConvectionColumns out = new ConvectionColumns(n);
        double[] block = new double[n * ZoneMajorJacobian.PER_ZONE];
        Runnable zoneMajor = () -> {
            convection.solveZoneMajor(in, 0, n, out, block);
            sink += out.nabla[n / 2] + block[n / 2];
        };
        DoubleBuffer direct = ByteBuffer.allocateDirect(n * ZoneMajorJacobian.PER_ZONE * Double.BYTES)
                .order(ByteOrder.nativeOrder()).asDoubleBuffer();
        Runnable buffer = () -> {
            convection.solveZoneMajorInto(in, 0, n, out, direct);
            sink += out.nabla[n / 2] + direct.get(n / 2);
        };
        Runnable columns = () -> {
            convection.solveColumns(in, 0, n, out, true);
            sink += out.nabla[n / 2] + out.dNabla[0][n / 2];
        };
        report("java: convection with the zone-major Jacobian, " + n + " zones per call, solveZoneMajor from Java",
                zoneMajor, n, warmup, rounds, calls);
        report("java-buffer: convection with the zone-major Jacobian, " + n
                + " zones per call, solveZoneMajorInto a direct buffer from Java", buffer, n, warmup, rounds, calls);
        report("java: convection with the column Jacobian, " + n + " zones per call, solveColumns from Java",
                columns, n, warmup, rounds, calls);
    }

    private static void report(String what, Runnable call, int n, double warmup, int rounds, int calls) {
        long start = System.nanoTime();
        long warm = 0;
        while (System.nanoTime() - start < warmup * 1e9) {
            for (int c = 0; c < 50; c++) {
                call.run();
                warm++;
            }
        }
        double[] perZone = new double[rounds];
        for (int r = 0; r < rounds; r++) {
            long t0 = System.nanoTime();
            for (int c = 0; c < calls; c++) {
                call.run();
            }
            perZone[r] = (System.nanoTime() - t0) / ((double) calls * n);
        }
        Arrays.sort(perZone);
        System.out.printf("%s: median %.1f ns per zone, fastest round %.1f (%d rounds of %d calls after %d warm-up "
                + "calls; sink %g)%n", what, perZone[rounds / 2], perZone[0], rounds, calls, warm, sink);
    }
}
