package io.github.startransport.spi;

/** What a table-backed model does with a query outside its table, chosen by the caller. */
public enum OutOfRangePolicy {
    /** Throw {@link InvalidInputException} naming the coordinate and the table's range. */
    REFUSE,
    /** Evaluate at the nearest point on the table's edge; derivatives along clamped axes are 0. */
    CLAMP,
    /** Continue the edge cell's polynomial outwards. */
    EXTRAPOLATE
}
