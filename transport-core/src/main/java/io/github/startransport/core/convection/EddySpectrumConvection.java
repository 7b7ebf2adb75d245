package io.github.startransport.core.convection;

import io.github.startransport.spi.ConvectionColumns;
import io.github.startransport.spi.ConvectionModel;
import io.github.startransport.spi.ConvectionResult;
import io.github.startransport.spi.Criterion;
import io.github.startransport.spi.ModelFamily;
import io.github.startransport.spi.ModelInfo;
import io.github.startransport.spi.ModelOptions;
import io.github.startransport.spi.OptionInfo;
import io.github.startransport.spi.ZoneColumns;
import io.github.startransport.spi.ZoneState;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Local convection with the flux of the full spectrum of turbulent eddies (Canuto &amp; Mazzitelli 1991, ApJ
 * 370, 295) instead of the one eddy of mixing-length theory: the same zone in, the same result out, the
 * same stability rules and stable-zone mixing coefficients as the mixing-length models, with the flux of
 * {@link SpectrumFlux} and the exact Jacobian. Kernel: {@link EddySpectrumZone}.
 *
 * <p>Length scale ({@code length-scale}): {@code scale-height}, Lambda = alpha H_P (with the near-centre
 * limit of {@code centre-limit}); or {@code edge-distance}, Lambda = alpha z with z the distance to the
 * nearest edge of the zone's convective region, which the caller puts in
 * {@link ZoneState#edgeDistance} (the diagnosis does; {@link #needsEdgeDistance()} is then true), alpha = 1
 * being Canuto &amp; Mazzitelli's own choice (from memory). Default alpha = 1: this library has no solar
 * calibration of the theory with Lambda = alpha H_P, so 1 is a neutral start; calibrate it as one
 * calibrates the mixing-length alpha.
 *
 * <p>Immutable and thread-safe; {@link #solve} allocates nothing.
 */
public final class EddySpectrumConvection implements ConvectionModel {
    /** Name to ask for this model by. */
    public static final String NAME = "eddy-spectrum";

    /** Default alpha (see the class comment). */
    public static final double DEFAULT_ALPHA = 1.0;

    static final String LENGTH_SCALE = "length-scale";

    /** Describes this model and its options. */
    public static final ModelInfo INFO = new ModelInfo(ModelFamily.CONVECTION, NAME,
            "local convection with the full-spectrum turbulent flux of Canuto & Mazzitelli (1991), Phi(S) = a S^k "
                    + "[(1 + b S)^m - 1]^n; length scale alpha H_P or alpha times the distance to the nearest edge; "
                    + "exact Jacobian and the same stability rules and mixing coefficients as "
                    + LocalMixingLength.NAME,
            options());

    private final ConvectionSettings settings;
    private final LengthScale scale;

    /** The model with every option at its default. */
    public EddySpectrumConvection() {
        this(ConvectionSettings.defaults().withAlpha(DEFAULT_ALPHA), LengthScale.SCALE_HEIGHT);
    }

    /**
     * @param alpha     Lambda / H_P or Lambda / z (dimensionless), &gt; 0
     * @param criterion stability criterion
     * @param scale     the length scale
     */
    public EddySpectrumConvection(double alpha, Criterion criterion, LengthScale scale) {
        this(new ConvectionSettings(alpha, criterion, MixingLengthGeometry.BOHM_VITENSE_1958, CentreLimit.RADIUS,
                ConvectionSettings.DEFAULT_SEMICONVECTION, ConvectionSettings.DEFAULT_THERMOHALINE,
                ConvectionSettings.DEFAULT_OVERSHOOT), scale);
    }

    private EddySpectrumConvection(ConvectionSettings settings, LengthScale scale) {
        this.settings = settings;
        this.scale = Objects.requireNonNull(scale, "scale");
    }

    private static List<OptionInfo> options() {
        List<OptionInfo> list = new ArrayList<>();
        for (OptionInfo o : ConvectionSettings.OPTIONS) {
            if (o.name().equals(ConvectionSettings.GEOMETRY)) {
                continue;
            }
            if (o.name().equals(ConvectionSettings.ALPHA)) {
                list.add(new OptionInfo(ConvectionSettings.ALPHA, Double.toString(DEFAULT_ALPHA), "1",
                        "Lambda / H_P, or Lambda / z with length-scale=edge-distance (1 there is Canuto & "
                                + "Mazzitelli's Lambda = z); no solar calibration with H_P here: calibrate"));
                continue;
            }
            if (o.name().equals(ConvectionSettings.CENTRE_LIMIT)) {
                list.add(new OptionInfo(LENGTH_SCALE, LengthScale.SCALE_HEIGHT.label(), "",
                        "scale-height: Lambda = alpha H_P; edge-distance: Lambda = alpha z, z the distance to the "
                                + "nearest edge of the convective region (ZoneState.edgeDistance, filled by the "
                                + "diagnosis)"));
            }
            list.add(o);
        }
        return list;
    }

    /**
     * @param options see {@link #INFO}
     * @return the model
     */
    public static EddySpectrumConvection fromOptions(ModelOptions options) {
        options.requireKnown(NAME, INFO.optionNames());
        ConvectionSettings parsed = ConvectionSettings.parse(NAME, options);
        double alpha = options.getDouble(NAME, ConvectionSettings.ALPHA, DEFAULT_ALPHA);
        return new EddySpectrumConvection(parsed.withAlpha(alpha),
                options.getEnum(NAME, LENGTH_SCALE, LengthScale.class, LengthScale.SCALE_HEIGHT));
    }

    /**
     * @param alpha another alpha (dimensionless), &gt; 0
     * @return this model with that alpha and every other setting kept
     */
    public EddySpectrumConvection withAlpha(double alpha) {
        return new EddySpectrumConvection(settings.withAlpha(alpha), scale);
    }

    /** @return the length scale in use */
    public LengthScale lengthScale() {
        return scale;
    }

    @Override
    public double alpha() {
        return settings.alpha();
    }

    @Override
    public Criterion criterion() {
        return settings.criterion();
    }

    @Override
    public boolean needsEdgeDistance() {
        return scale == LengthScale.EDGE_DISTANCE;
    }

    @Override
    public void solve(ZoneState zone, ConvectionResult out) {
        EddySpectrumZone.solve(zone, settings.alpha(), scale, settings.centreLimit(), settings.criterion(),
                settings.semiconvection(), settings.thermohaline(), out, true);
    }

    @Override
    public void solveValues(ZoneState zone, ConvectionResult out) {
        EddySpectrumZone.solve(zone, settings.alpha(), scale, settings.centreLimit(), settings.criterion(),
                settings.semiconvection(), settings.thermohaline(), out, false);
    }

    /** A loop over the static kernel with the output's working space (bit for bit the per-zone calls). */
    @Override
    public void solveColumns(ZoneColumns in, int from, int to, ConvectionColumns out, boolean jacobian) {
        in.checkRange(from, to, out.capacity);
        final ZoneState zone = out.workZone;
        final ConvectionResult r = out.workResult;
        final double alpha = settings.alpha();
        final CentreLimit limit = settings.centreLimit();
        final Criterion criterion = settings.criterion();
        final double semiconvection = settings.semiconvection();
        final double thermohaline = settings.thermohaline();
        for (int k = from; k < to; k++) {
            EddySpectrumZone.solve(in.load(k, zone), alpha, scale, limit, criterion, semiconvection, thermohaline, r,
                    jacobian);
            out.store(k, r, jacobian);
        }
    }

    @Override
    public double overshootParameter() {
        return settings.overshoot();
    }

    @Override
    public double overshootDiffusion(double boundaryDiffusion, double distance, double scaleHeight) {
        return settings.overshootDiffusion(boundaryDiffusion, distance, scaleHeight);
    }

    @Override
    public String toString() {
        return NAME + "(" + settings.describe().replace(", geometry=" + settings.geometry().label(), "") + ", "
                + LENGTH_SCALE + "=" + scale.label() + ")";
    }
}
