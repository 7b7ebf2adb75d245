package io.github.startransport.spi;

/** What an opacity lookup did with its query point. */
public enum OpacityStatus {
    /** The point was inside the model's domain (or the model has no edges). */
    INSIDE,
    /** The point was outside and was moved to the nearest edge ({@link OutOfRangePolicy#CLAMP}). */
    CLAMPED,
    /** The point was outside and the edge cells were continued ({@link OutOfRangePolicy#EXTRAPOLATE}). */
    EXTRAPOLATED
}
