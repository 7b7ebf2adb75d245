package io.github.startransport.examples;

// snippet-start: host-whole-profile
import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OpacityColumns;
import io.github.startransport.spi.OpacityModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneInput;

/** A host's convection step over a whole profile in two batch calls (cgs, K). */
public final class WholeProfile {
    private final OpacityModel opacity;                        // models: immutable, thread-safe
    private final ConvectionModel mlt;
    private final ZoneColumns in;                              // columns: allocated once, reused every call
    private final OpacityColumns kappa;
    private final ConvectionColumns out;

    public WholeProfile(Transport transport, int zones) {
        opacity = transport.opacity("analytic-composite", ModelOptions.defaults());
        mlt = transport.convection("local-mixing-length", ModelOptions.parse("alpha=1.8,criterion=ledoux"));
        in = new ZoneColumns(zones);
        kappa = new OpacityColumns(zones);
        out = new ConvectionColumns(zones);
    }

    /** Solves every zone; the results (out.nabla[k], out.dNabla[ZoneInput.T][k], ...) stay until the next call. */
    public ConvectionColumns solve(double[] r, double[] m, double[] T, double[] rho, double[] P, double[] L,
                                   double[] X, double[] Z, double[] cp, double[] nablaAd, double[] delta,
                                   double[] nablaMu) {
        int n = in.capacity;
        for (int k = 0; k < n; k++) {                          // in.phi starts at 1 (ideal gas)
            in.radius[k] = r[k]; in.mass[k] = m[k]; in.temperature[k] = T[k]; in.density[k] = rho[k];
            in.pressure[k] = P[k]; in.luminosity[k] = L[k]; in.hydrogen[k] = X[k]; in.metals[k] = Z[k];
            in.cp[k] = cp[k]; in.nablaAd[k] = nablaAd[k]; in.delta[k] = delta[k]; in.nablaMu[k] = nablaMu[k];
        }
        opacity.evaluateColumns(in, 0, n, kappa);              // kappa(T, rho, X, Z) and its log derivatives
        System.arraycopy(kappa.kappa, 0, in.opacity, 0, n);    // convection reads kappa from in.opacity
        mlt.solveColumns(in, 0, n, out, true);                 // true: fill the derivative columns too
        return out;
    }

    /** d nabla / d T of zone k (K^-1) with kappa following T: the partial plus the chain through kappa. */
    public double dNablaDTWithKappa(int k) {
        return out.dNabla[ZoneInput.T][k]
                + out.dNabla[ZoneInput.KAPPA][k] * kappa.dLnKappaDLnT[k] * kappa.kappa[k] / in.temperature[k];
    }
}
// snippet-end: host-whole-profile
