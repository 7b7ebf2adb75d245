package io.github.startransport.cli;

import io.github.startransport.spi.Timescales;

import java.util.List;

/**
 * What a track keeps of one diagnosed profile: where it stands in the sequence and its layers.
 *
 * @param source      the profile file, as given
 * @param position    its place on the command line, from 1
 * @param modelNumber its model number ({@code # model_number =} line, or its position once the track is
 *                    made), or {@code null}
 * @param age         its age (yr), or {@code null} when unknown
 * @param mass        the star's mass M (g)
 * @param radius      its radius R (cm)
 * @param luminosity  its surface luminosity (erg s^-1)
 * @param timescales  its whole-star timescales (s); an undefined one is NaN
 * @param layers      its convective, semiconvective and thermohaline regions (and overshoot layers), centre
 *                    to surface
 */
record TrackPoint(String source, int position, Long modelNumber, Double age, double mass, double radius,
                  double luminosity, Timescales timescales, List<Layer> layers) {
    /**
     * One region of a profile.
     *
     * @param regime  {@code convective}, {@code semiconvective}, {@code thermohaline} or {@code overshoot}
     * @param mBottom mass at its bottom (g)
     * @param mTop    mass at its top (g)
     * @param rBottom radius at its bottom (cm)
     * @param rTop    radius at its top (cm)
     */
    record Layer(String regime, double mBottom, double mTop, double rBottom, double rTop) {
    }

    /**
     * @param number the model number to use
     * @return this point with that model number
     */
    TrackPoint numbered(long number) {
        return new TrackPoint(source, position, number, age, mass, radius, luminosity, timescales, layers);
    }
}
