package io.github.startransport.examples;

// snippet-start: host-zone-by-zone
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.ZoneInput;
import io.github.startransport.spi.ZoneState;

/** A host's convection step, one zone at a time (cgs, K). One instance per thread. */
public final class ZoneByZone {
    private final ConvectionModel mlt;                         // immutable: share it between threads
    private final ZoneState zone = new ZoneState();            // caller-owned, reused for every zone
    private final ConvectionResult out = new ConvectionResult();

    public ZoneByZone(Transport transport) {
        mlt = transport.convection("local-mixing-length", ModelOptions.parse("alpha=1.8,criterion=ledoux"));
    }

    /** Writes nabla[k] and dNablaDT[k] = d nabla / d T (K^-1) for every zone of the host's columns. */
    public void solve(double[] r, double[] m, double[] T, double[] rho, double[] P, double[] L,
                      double[] kappa, double[] cp, double[] nablaAd, double[] delta, double[] phi,
                      double[] nablaMu, double[] nabla, double[] dNablaDT) {
        for (int k = 0; k < r.length; k++) {
            zone.zone = k;                                     // only used in error messages
            zone.radius = r[k]; zone.mass = m[k]; zone.temperature = T[k]; zone.density = rho[k];
            zone.pressure = P[k]; zone.luminosity = L[k]; zone.opacity = kappa[k]; zone.cp = cp[k];
            zone.nablaAd = nablaAd[k]; zone.delta = delta[k]; zone.phi = phi[k]; zone.nablaMu = nablaMu[k];
            mlt.solve(zone, out);                              // allocates nothing
            nabla[k] = out.nabla;                              // also out.regime, out.velocity, out.diffusion, ...
            dNablaDT[k] = out.dNabla[ZoneInput.T];             // partial derivatives, indexed by ZoneInput
        }
    }
}
// snippet-end: host-zone-by-zone
