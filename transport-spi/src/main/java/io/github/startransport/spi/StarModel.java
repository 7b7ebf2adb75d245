package io.github.startransport.spi;

/**
 * A built-in stellar model that needs no input file (for demonstrations and tests).
 */
public interface StarModel {

    /** @return one paragraph: what star this is and how it is built */
    String description();

    /** @return the model as a profile, centre to surface */
    Profile profile();
}
