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
}
