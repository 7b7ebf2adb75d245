package io.github.startransport.bridge;

import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.Regime;
import io.github.startransport.spi.StabilityColumns;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Writes what the example hosts compare against: {@code models.txt}, {@code profile.csv} (see
 * {@link ExampleData}) and {@code reference.csv}, the results of the same batch calls made through
 * the Java API on the same zones: thermodynamics, opacity ({@code evaluateColumns}), the
 * stability test ({@code evaluateColumns}) and convection with its Jacobian ({@code solveColumns},
 * the column layout, so that the hosts' zone-major blocks are checked against the other layout).
 *
 * <p>Usage: {@code java -cp <jars> io.github.startransport.bridge.ExampleReference DIR [POINTS [ZONES]]}
 * (POINTS asked of the demo star, default 800; it gives about that many zones, of which the first
 * ZONES are kept when given). reference.csv has one row per zone and
 * the columns named in its header; regime and lookup codes are the C header's
 * ({@code STT_RADIATIVE} = 0 ..., {@code STT_INSIDE} = 0 ...).
 */
public final class ExampleReference {
    private ExampleReference() {
    }

    /** Regime labels in the order of the C header's enum stt_regime. */
    private static final List<String> REGIMES = List.of("radiative", "convective", "semiconvective", "thermohaline");
    /** Opacity lookup names in the order of the C header's enum stt_opacity_status. */
    private static final List<String> LOOKUPS = List.of("INSIDE", "CLAMPED", "EXTRAPOLATED");

    /**
     * @param args output directory, and optionally the number of points of the demo star
     * @throws IOException when a file cannot be written
     */
    public static void main(String[] args) throws IOException {
        if (args.length < 1) {
            System.err.println("usage: ExampleReference DIR [POINTS [ZONES]]");
            System.exit(2);
        }
        Path dir = Path.of(args[0]);
        int points = args.length > 1 ? Integer.parseInt(args[1]) : 800;
        int limit = args.length > 2 ? Integer.parseInt(args[2]) : Integer.MAX_VALUE;
        Files.createDirectories(dir);
        Transport transport = Transport.discover();
        ExampleData.writeModels(dir.resolve("models.txt"));
        int n = ExampleData.writeProfile(transport, dir.resolve("profile.csv"), points, limit);
        write(transport, dir);
        System.out.println("reference: " + n + " zones written to " + dir);
    }

    static void write(Transport transport, Path dir) throws IOException {
        ZoneColumns in = ExampleData.readProfile(dir.resolve("profile.csv"));
        int n = in.capacity;
        ThermodynamicsModel thermo = (ThermodynamicsModel) ExampleData.model(transport, 0);
        OpacityModel opacity = (OpacityModel) ExampleData.model(transport, 1);
        StabilityModel stability = (StabilityModel) ExampleData.model(transport, 2);
        ConvectionModel convection = (ConvectionModel) ExampleData.model(transport, 3);
        double[][] th = new double[8][n];
        OpacityColumns op = new OpacityColumns(n);
        ExampleData.complete(in, thermo, opacity, th, op);
        StabilityColumns st = new StabilityColumns(n);
        stability.evaluateColumns(in, 0, n, st);
        ConvectionColumns cv = new ConvectionColumns(n);
        convection.solveColumns(in, 0, n, cv, true);

        StringBuilder header = new StringBuilder(
                "mu,beta,P_eos,nabla_ad,cp,delta,phi,gamma1,kappa,dlnkappa_dlnrho,dlnkappa_dlnT,lookup,"
                        + "stab_regime,stab_nabla_rad,stab_nabla_ad,nabla_L,margin_schwarzschild,margin_ledoux");
        for (String o : new String[] {"nabla_rad", "nabla_L"}) {
            for (int i = 0; i < ZoneInput.COUNT; i++) {
                header.append(",d_").append(o).append("/d_").append(ZoneInput.name(i));
            }
        }
        header.append(",regime,nabla_rad,nabla,nabla_e,v_conv,Fconv_F,Frad_F,Gamma,U,H_P,l,D");
        for (String o : new String[] {"nabla", "v_conv", "Fconv_F", "D"}) {
            for (int i = 0; i < ZoneInput.COUNT; i++) {
                header.append(",d_").append(o).append("/d_").append(ZoneInput.name(i));
            }
        }
        try (BufferedWriter w = Files.newBufferedWriter(dir.resolve("reference.csv"), StandardCharsets.UTF_8)) {
            w.write(header.toString());
            w.write('\n');
            for (int k = 0; k < n; k++) {
                StringBuilder row = new StringBuilder();
                for (double[] column : th) {
                    row.append(column[k]).append(',');
                }
                row.append(op.kappa[k]).append(',').append(op.dLnKappaDLnRho[k]).append(',')
                        .append(op.dLnKappaDLnT[k]).append(',').append(LOOKUPS.indexOf(op.status[k].name())).append(',');
                row.append(code(st.regime[k])).append(',').append(st.nablaRad[k]).append(',').append(st.nablaAd[k])
                        .append(',').append(st.nablaLedoux[k]).append(',').append(st.marginSchwarzschild[k]).append(',')
                        .append(st.marginLedoux[k]);
                for (double[][] d : new double[][][] {st.dNablaRad, st.dNablaLedoux}) {
                    for (int i = 0; i < ZoneInput.COUNT; i++) {
                        row.append(',').append(d[i][k]);
                    }
                }
                row.append(',').append(code(cv.regime[k]));
                for (double[] v : new double[][] {cv.nablaRad, cv.nabla, cv.nablaElement, cv.velocity,
                    cv.convectiveFraction, cv.radiativeFraction, cv.efficiency, cv.lossParameter, cv.scaleHeight,
                    cv.mixingLength, cv.diffusion}) {
                    row.append(',').append(v[k]);
                }
                for (double[][] d : new double[][][] {cv.dNabla, cv.dVelocity, cv.dConvectiveFraction,
                    cv.dDiffusion}) {
                    for (int i = 0; i < ZoneInput.COUNT; i++) {
                        row.append(',').append(d[i][k]);
                    }
                }
                row.append('\n');
                w.write(row.toString());
            }
        }
    }

    private static int code(Regime r) {
        return REGIMES.indexOf(r.label());
    }
}
