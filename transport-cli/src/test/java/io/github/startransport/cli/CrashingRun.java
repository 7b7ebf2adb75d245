package io.github.startransport.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A child process for {@link OutputFolderCrashTest}: one run of {@link OutputFolder} that writes
 * {@code zones.csv} with the given text and is killed ({@link Runtime#halt}, no clean-up, no
 * shutdown hooks) when it reaches the given step. Arguments: output folder, step name (or
 * {@code NONE}, or {@code DELETE_OLD} for the first deletion after the swap), text.
 */
final class CrashingRun {
    /** Exit status of a run killed on purpose. */
    static final int KILLED = 77;

    private CrashingRun() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args[0]);
        String at = args[1];
        boolean[] swapped = {false};
        OutputFolder.faults = (step, path) -> {
            if (step == OutputFolder.Step.SWAPPED) {
                swapped[0] = true;
            }
            boolean deleteOld = at.equals("DELETE_OLD") && step == OutputFolder.Step.DELETE && swapped[0];
            if (deleteOld || step.name().equals(at)) {
                Runtime.getRuntime().halt(KILLED);
            }
        };
        List<String> notes = new ArrayList<>();
        try (OutputFolder f = OutputFolder.open(out, List.of("crash-test", at), notes)) {
            Files.writeString(f.staging().resolve("zones.csv"), args[2]);
            Files.createDirectories(f.staging().resolve("sub"));
            Files.writeString(f.staging().resolve("sub/summary.json"), args[2]);
            f.commit();
        }
        System.exit(0);
    }
}
