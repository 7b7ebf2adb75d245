package io.github.startransport.cli;

/**
 * The names of the models a diagnosis was made with, as reported in the summary.
 *
 * @param convection   convection model name
 * @param opacity      opacity model name
 * @param opacityTable the opacity table file, or {@code null} when no table was used
 */
record ModelsUsed(String convection, String opacity, String opacityTable) {
}
