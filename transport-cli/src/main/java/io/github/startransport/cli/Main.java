package io.github.startransport.cli;

import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.StabilityModel;
import io.github.startransport.spi.StabilityResult;
import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;
import io.github.startransport.spi.Transport;
import io.github.startransport.spi.TransportProvider;
import io.github.startransport.spi.ZoneState;

import java.io.PrintStream;
import java.util.Locale;

/**
 * A host-style program: discovers the physics through the SPI only and prints the stability
 * classification of a few example zones under both criteria.
 */
public final class Main {
    private Main() {
    }

    /**
     * @param args ignored
     */
    public static void main(String[] args) {
        System.exit(run(System.out, System.err));
    }

    static int run(PrintStream out, PrintStream err) {
        Transport transport;
        try {
            transport = Transport.discover();
        } catch (RuntimeException e) {
            err.println("startransport: " + e.getMessage());
            return 1;
        }
        for (TransportProvider p : transport.providers()) {
            out.println("provider " + p.name() + ": " + p.description());
        }
        ThermodynamicsModel eos = transport.thermodynamics(null, ModelOptions.defaults());
        StabilityModel schwarzschild = transport.stability(null, ModelOptions.parse("criterion=schwarzschild"));
        StabilityModel ledoux = transport.stability(null, ModelOptions.parse("criterion=ledoux"));
        ZoneState z = new ZoneState();
        ThermoResult thermo = new ThermoResult();
        StabilityResult s = new StabilityResult();
        StabilityResult l = new StabilityResult();
        out.println();
        out.println(String.format(Locale.ROOT, "%-34s %10s %9s %9s %9s  %-15s %-15s",
                "example zone (invented)", "log T", "nabla_rad", "nabla_ad", "nabla_L", "schwarzschild", "ledoux"));
        for (Example e : EXAMPLES) {
            z.radius = e.r;
            z.mass = e.m;
            z.temperature = e.t;
            z.density = e.rho;
            z.luminosity = e.lum;
            z.opacity = e.kappa;
            z.hydrogen = e.x;
            z.metals = e.zMetals;
            z.nablaMu = e.nablaMu;
            eos.complete(z, thermo);
            schwarzschild.evaluate(z, s);
            ledoux.evaluate(z, l);
            out.println(String.format(Locale.ROOT, "%-34s %10.3f %9.4f %9.4f %9.4f  %-15s %-15s", e.label,
                    Math.log10(e.t), s.nablaRad, s.nablaAd, s.nablaLedoux, s.regime.label(), l.regime.label()));
        }
        return 0;
    }

    private record Example(String label, double r, double m, double t, double rho, double lum, double kappa,
                           double x, double zMetals, double nablaMu) {
    }

    /** Invented demonstration zones, cgs. */
    private static final Example[] EXAMPLES = {
        new Example("hot core, high luminosity", 3e10, 4e33, 2.5e7, 20.0, 1.0e37, 0.35, 0.7, 0.02, 0.0),
        new Example("radiative mantle", 2e11, 1.5e33, 6e6, 2.0, 3.8e33, 2.0, 0.7, 0.02, 0.0),
        new Example("edge of a receding core, mu step", 4e10, 2e33, 2.0e7, 30.0, 1.7e36, 0.35, 0.5, 0.02, 0.5),
        new Example("mu inversion (burning shell above)", 1e11, 1e33, 1.0e7, 5.0, 1.0e33, 1.0, 0.7, 0.02, -0.05),
        new Example("neutrino-cooled core (L < 0)", 1e9, 5e32, 8.0e8, 1e5, -1.0e36, 0.2, 0.0, 0.02, 0.0),
    };
}
