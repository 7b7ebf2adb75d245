package io.github.startransport.cli;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The output folder is always the old result or the new one, whole, never absent: with a run
 * killed at every step (a child process halted by a hook, so no clean-up code runs), and with
 * a second run committing while the first is stopped at every step.
 */
class OutputFolderCrashTest {

    @AfterEach
    void noHook() {
        OutputFolder.faults = (s, p) -> {
        };
    }

    /** What DIR shows: the text of both files when they agree, or a description of what is wrong. */
    private static String seen(Path out) {
        try {
            Files.readSymbolicLink(out);
        } catch (NoSuchFileException e) {
            return "ABSENT";
        } catch (IOException e) {
            return "NOT A LINK: " + e;
        }
        try {
            Path real = out.toRealPath();
            String a = Files.readString(real.resolve("zones.csv"));
            String b = Files.readString(real.resolve("sub/summary.json"));
            return a.equals(b) ? a : "TORN: " + a + " / " + b;
        } catch (NoSuchFileException e) {
            return null; // the link moved on and the old folder went meanwhile: not an observation of DIR
        } catch (IOException e) {
            return "UNREADABLE: " + e;
        }
    }

    private static void run(Path out, String text) throws IOException {
        try (OutputFolder f = OutputFolder.open(out, List.of("test"), new ArrayList<>())) {
            Files.writeString(f.staging().resolve("zones.csv"), text);
            Files.createDirectories(f.staging().resolve("sub"));
            Files.writeString(f.staging().resolve("sub/summary.json"), text);
            f.commit();
        }
    }

    private static int child(Path out, String step, String text) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-Xshare:auto", "-XX:TieredStopAtLevel=1", "-cp",
                System.getProperty("java.class.path"), CrashingRun.class.getName(), out.toString(), step, text)
                .redirectErrorStream(true).start();
        String printed = new String(p.getInputStream().readAllBytes());
        assertTrue(p.waitFor(60, TimeUnit.SECONDS));
        assertTrue(p.exitValue() == 0 || p.exitValue() == CrashingRun.KILLED, printed);
        return p.exitValue();
    }

    @Test
    void aRunKilledAtAnyStepLeavesTheOldOrTheNewResultAndTheNextRunCleansUp(@TempDir Path dir) throws Exception {
        List<String> steps = new ArrayList<>();
        for (OutputFolder.Step s : OutputFolder.Step.values()) {
            if (s != OutputFolder.Step.DELETE) {
                steps.add(s.name());
            }
        }
        steps.add("DELETE_OLD");
        for (String step : steps) {
            Path out = dir.resolve("out-" + step);
            run(out, "old");
            int code = child(out, step, "new");
            String after = seen(out);
            boolean swapped = Set.of("SWAPPED", "COMMIT_UNLOCKED", "DELETE_OLD", "OLD_REMOVED").contains(step);
            assertEquals(CrashingRun.KILLED, code, step);
            assertEquals(swapped ? "new" : "old", after, "killed at " + step);
            // the next run finds what the killed one left, removes it, and commits
            run(out, "next");
            assertEquals("next", seen(out), step);
            assertEquals(OutputFolderTest.expectedBeside(dir, out.getFileName().toString()),
                    OutputFolderTest.names(dir).stream().filter(n -> n.contains("out-" + step)).toList(), step);
        }
        // and a run that is not killed commits normally in a child process too
        Path out = dir.resolve("plain");
        assertEquals(0, child(out, "NONE", "whole"));
        assertEquals("whole", seen(out));
    }

    @Test
    void aSecondRunCommittingWhileTheFirstIsStoppedAtAnyStepLeavesOneWholeResult(@TempDir Path dir)
            throws Exception {
        for (OutputFolder.Step stop : OutputFolder.Step.values()) {
            if (stop == OutputFolder.Step.DELETE) {
                continue;
            }
            Path out = dir.resolve("out-" + stop);
            run(out, "old");
            CountDownLatch reached = new CountDownLatch(1);
            CountDownLatch go = new CountDownLatch(1);
            AtomicReference<Thread> first = new AtomicReference<>();
            OutputFolder.faults = (step, path) -> {
                if (step == stop && Thread.currentThread() == first.get() && reached.getCount() > 0) {
                    reached.countDown();
                    try {
                        go.await(30, TimeUnit.SECONDS);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                }
            };
            ConcurrentLinkedQueue<String> odd = new ConcurrentLinkedQueue<>();
            AtomicBoolean watching = new AtomicBoolean(true);
            Thread watcher = new Thread(() -> {
                while (watching.get()) {
                    String s = seen(out);
                    if (s != null && !Set.of("old", "A", "B").contains(s)) {
                        odd.add(s);
                    }
                }
            });
            watcher.start();
            AtomicReference<Throwable> failedA = new AtomicReference<>();
            AtomicReference<Throwable> failedB = new AtomicReference<>();
            Thread a = new Thread(() -> {
                try {
                    run(out, "A");
                } catch (Throwable t) {
                    failedA.set(t);
                }
            });
            first.set(a);
            a.start();
            assertTrue(reached.await(30, TimeUnit.SECONDS), "run A never reached " + stop);
            Thread b = new Thread(() -> {
                try {
                    run(out, "B");
                } catch (Throwable t) {
                    failedB.set(t);
                }
            });
            b.start();
            b.join(300); // B finishes, or waits for the lock A holds
            go.countDown();
            a.join(30_000);
            b.join(30_000);
            watching.set(false);
            watcher.join();
            assertEquals(null, failedA.get(), "run A, stopped at " + stop);
            assertEquals(null, failedB.get(), "run B, while A was stopped at " + stop);
            assertTrue(odd.isEmpty(), "stopped at " + stop + ", DIR showed " + odd);
            String end = seen(out);
            assertTrue(end.equals("A") || end.equals("B"), stop + ": " + end);
            run(out, "last");
            assertEquals(OutputFolderTest.expectedBeside(dir, out.getFileName().toString()),
                    OutputFolderTest.names(dir).stream().filter(n -> n.contains("out-" + stop)).toList(),
                    stop.name());
        }
    }
}
