package io.github.startransport.core.convection;

import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneState;

import java.nio.DoubleBuffer;

/**
 * What the mixing-length models share: their options and the calls into {@link MixingLengthZone}.
 * The variants differ only in the transparency factor y of the eddies' radiative losses (0 for
 * the textbook theory).
 *
 * <p>Immutable and thread-safe; the per-zone and batch calls allocate nothing.
 */
public abstract sealed class MixingLengthModel implements ConvectionModel
        permits LocalMixingLength, TransparentEddyMixingLength {
    final ConvectionSettings settings;
    final double eddyShape;

    MixingLengthModel(ConvectionSettings settings, double eddyShape) {
        this.settings = settings;
        this.eddyShape = eddyShape;
    }

    @Override
    public double alpha() {
        return settings.alpha();
    }

    @Override
    public Criterion criterion() {
        return settings.criterion();
    }

    /** @return the geometry constants in use */
    public MixingLengthGeometry geometry() {
        return settings.geometry();
    }

    /** @return the near-centre limit of the mixing length */
    public CentreLimit centreLimit() {
        return settings.centreLimit();
    }

    /** @return alpha_sc of semiconvective mixing (dimensionless) */
    public double semiconvectionEfficiency() {
        return settings.semiconvection();
    }

    /** @return C_t of thermohaline mixing (dimensionless) */
    public double thermohalineEfficiency() {
        return settings.thermohaline();
    }

    @Override
    public void solve(ZoneState zone, ConvectionResult out) {
        MixingLengthZone.solve(zone, settings.alpha(), settings.geometry(), eddyShape, settings.centreLimit(),
                settings.criterion(), settings.semiconvection(), settings.thermohaline(), out);
    }

    @Override
    public void solveValues(ZoneState zone, ConvectionResult out) {
        MixingLengthZone.solve(zone, settings.alpha(), settings.geometry(), eddyShape, settings.centreLimit(),
                settings.criterion(), settings.semiconvection(), settings.thermohaline(), out, false);
    }

    /** Loops over the static kernel: see {@link MixingLengthZone#solveColumns}. */
    @Override
    public void solveColumns(ZoneColumns in, int from, int to, ConvectionColumns out, boolean jacobian) {
        MixingLengthZone.solveColumns(settings, eddyShape, in, from, to, out, jacobian);
    }

    /**
     * The batch kernel of {@link #solveColumns} with each zone's Jacobian written straight into its
     * contiguous block: one stream of stores per zone instead of the column layout's 52.
     */
    @Override
    public void solveZoneMajor(ZoneColumns in, int from, int to, ConvectionColumns out, double[] jacobian) {
        MixingLengthZone.solveZoneMajor(settings, eddyShape, in, from, to, out, jacobian);
    }

    /** The batch kernel of {@link #solveZoneMajor}, each chunk's Jacobian put into the buffer in one bulk put. */
    @Override
    public void solveZoneMajorInto(ZoneColumns in, int from, int to, ConvectionColumns out, DoubleBuffer jacobian) {
        MixingLengthZone.solveZoneMajor(settings, eddyShape, in, from, to, out, jacobian);
    }

    @Override
    public double overshootParameter() {
        return settings.overshoot();
    }

    @Override
    public double overshootDiffusion(double boundaryDiffusion, double distance, double scaleHeight) {
        return settings.overshootDiffusion(boundaryDiffusion, distance, scaleHeight);
    }
}
