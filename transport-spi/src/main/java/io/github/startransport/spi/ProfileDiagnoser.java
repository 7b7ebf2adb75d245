package io.github.startransport.spi;

import java.util.List;

/**
 * Diagnoses a whole profile: per-zone gradients and convection, regions and boundaries, and
 * timescales. Implementations are immutable and thread-safe; one instance may diagnose many
 * profiles at once.
 */
public interface ProfileDiagnoser {

    /**
     * @param profile the model
     * @param setup   the models to use
     * @return the diagnosis
     * @throws InvalidInputException naming the zone and field when a zone cannot be diagnosed; the zone
     *                               index counts in the order the profile was given (0-based), as in
     *                               {@link Profile}'s own refusals
     */
    ProfileDiagnosis diagnose(Profile profile, DiagnosisSetup setup);

    /**
     * Diagnoses several profiles on all available cores; the results are identical to
     * diagnosing them one after the other, and come back in the order given.
     *
     * @param profiles the models
     * @param setup    the models to use
     * @return one diagnosis per profile
     */
    default List<ProfileDiagnosis> diagnoseAll(List<Profile> profiles, DiagnosisSetup setup) {
        return profiles.parallelStream().map(p -> diagnose(p, setup)).toList();
    }

    /**
     * Overshoot mixing beyond the edges of convective regions, with the overshoot settings this
     * diagnoser was created with: the batch call for a host that has located its own convective
     * edges and computed its own mixing coefficients. The diagnoser applies the same call in
     * {@link #diagnose}.
     *
     * <p>Conventions: an edge at or below {@code radius[0]} is the centre (no overshoot below it), one at
     * or above {@code radius[n - 1]} the surface (none above it). The starting coefficient D_0 is read
     * from {@code diffusion}, linearly interpolated in r, at the distance the implementation states inside
     * each edge. Every zone gets the largest overshoot coefficient of all edges that reach it, 0 where
     * none does; a host combines it with its own coefficient (the diagnosis takes the larger of the two).
     * No derivatives: overshoot depends on the edges' positions, which are not zone inputs.
     *
     * @param radius       r per zone, centre to surface, strictly increasing (cm), &gt; 0
     * @param scaleHeight  pressure scale height H_P per zone (cm), finite and &gt; 0
     * @param diffusion    the mixing coefficient of each zone without overshoot (cm^2 s^-1), finite and &gt;= 0
     * @param regionBottom bottom radius of each convective region, centre to surface (cm), finite and &gt;= 0
     * @param regionTop    top radius of each convective region (cm), above its bottom and at or below the
     *                     next region's bottom
     * @param overshoot    output, as long as {@code radius}: the overshoot coefficient per zone
     *                     (cm^2 s^-1), overwritten
     * @param reachBottom  output, as long as {@code regionBottom}: r where overshoot mixing below each
     *                     region ends (cm); NaN where there is no bottom edge or no overshoot
     * @param reachTop     output, as long as {@code regionBottom}: r where overshoot mixing above each
     *                     region ends (cm); NaN where there is no top edge or no overshoot
     * @throws InvalidInputException         naming the column index of the first bad value, or the bad length
     * @throws UnsupportedOperationException when this diagnoser offers no overshoot
     */
    default void overshoot(double[] radius, double[] scaleHeight, double[] diffusion, double[] regionBottom,
                           double[] regionTop, double[] overshoot, double[] reachBottom, double[] reachTop) {
        throw new UnsupportedOperationException(getClass().getName() + " offers no overshoot mixing");
    }
}
