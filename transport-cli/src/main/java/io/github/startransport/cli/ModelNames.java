package io.github.startransport.cli;

/**
 * Every model and option name this tool asks the physics for, in one place: when a provider
 * renames one, this is the only file to change.
 *
 * <p>The tool never names a provider. Families without a name here are asked for their
 * default ({@code null} name), which is the first provider's recommended model.
 */
final class ModelNames {
    /** Option of the convection model: the mixing-length parameter alpha = l / H_P (dimensionless). */
    static final String CONVECTION_ALPHA = "alpha";

    /** Option of the convection model: {@code schwarzschild} or {@code ledoux}. */
    static final String CONVECTION_CRITERION = "criterion";

    /** The opacity model that reads a table file in the library's tidy CSV format. */
    static final String OPACITY_TABLE_MODEL = "table";

    /** Option of {@link #OPACITY_TABLE_MODEL}: path of the table file. */
    static final String OPACITY_TABLE_FILE = "file";

    /** Option of the diagnosis: f of exponential overshoot (dimensionless). */
    static final String DIAGNOSIS_OVERSHOOT_F = "overshoot-f";

    /** Option of the diagnosis: f0, where overshoot's D_0 is taken inside each edge (dimensionless). */
    static final String DIAGNOSIS_OVERSHOOT_F0 = "overshoot-f0";

    /** Option of the diagnosis: alpha_ov of step overshoot (dimensionless). */
    static final String DIAGNOSIS_OVERSHOOT_STEP = "overshoot-step";

    /** Option of the envelope model: lower end of the alpha interval a calibration searches (dimensionless). */
    static final String ENVELOPE_ALPHA_LOW = "alpha-low";

    /** Option of the envelope model: upper end of the alpha interval a calibration searches (dimensionless). */
    static final String ENVELOPE_ALPHA_HIGH = "alpha-high";

    private ModelNames() {
    }
}
