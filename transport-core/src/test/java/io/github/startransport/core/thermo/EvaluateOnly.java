package io.github.startransport.core.thermo;

import io.github.startransport.spi.ThermoResult;
import io.github.startransport.spi.ThermodynamicsModel;

import java.util.Arrays;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * For tests of callers of the values-only call: a model that answers both calls through
 * {@code inner.evaluate} (the values-only call as the interface's default does), counting the calls of
 * each kind; with {@code poison}, the values-only call then spoils every derivative, so that a caller
 * which read one would show it.
 */
public final class EvaluateOnly implements ThermodynamicsModel {
    private final ThermodynamicsModel inner;
    private final boolean poison;
    /** Calls of {@link #evaluate}. */
    public final AtomicInteger full = new AtomicInteger();
    /** Calls of {@link #evaluateValues}. */
    public final AtomicInteger values = new AtomicInteger();

    /**
     * @param inner  the model answering
     * @param poison whether the values-only call fills every derivative with NaN
     */
    public EvaluateOnly(ThermodynamicsModel inner, boolean poison) {
        this.inner = inner;
        this.poison = poison;
    }

    @Override
    public void evaluate(double temperature, double density, double hydrogen, double metals, int zone,
                         ThermoResult out) {
        full.incrementAndGet();
        inner.evaluate(temperature, density, hydrogen, metals, zone, out);
    }

    @Override
    public void evaluateValues(double temperature, double density, double hydrogen, double metals, int zone,
                               ThermoResult out) {
        values.incrementAndGet();
        inner.evaluate(temperature, density, hydrogen, metals, zone, out);
        if (poison) {
            for (double[] d : new double[][] {out.dPressure, out.dNablaAd, out.dCp, out.dDelta, out.dPhi,
                    out.dGamma1, out.dMu}) {
                Arrays.fill(d, Double.NaN);
            }
        }
    }

    @Override
    public String toString() {
        return inner.toString();      // warnings name the model
    }
}
