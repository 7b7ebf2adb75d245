package io.github.startransport.cli;

import io.github.startransport.spi.TransportException;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

/**
 * Runs one piece of work per profile on all cores, with a progress bar, and keeps going when a
 * profile is refused: every profile is attempted, and each outcome says what it gave or why it
 * failed. Only an {@link Error} (out of memory) stops the run.
 */
final class ProfileJobs {
    private ProfileJobs() {
    }

    /** The work of one job. */
    interface Work<J, R> {
        /**
         * @param job   the job
         * @param notes receives notes for the person running the tool (printed with the outcome)
         * @return the result
         * @throws IOException when a file cannot be read or written
         */
        R run(J job, List<String> notes) throws IOException;
    }

    /**
     * What one job gave.
     *
     * @param job     the job
     * @param result  its result, or {@code null} when it failed
     * @param failure why it failed (its message names file, line and column), or {@code null}
     * @param notes   notes collected while it ran
     * @param <J>     job type
     * @param <R>     result type
     */
    record Outcome<J, R>(J job, R result, RuntimeException failure, List<String> notes) {
        /** @return whether the job succeeded */
        boolean ok() {
            return failure == null;
        }
    }

    /**
     * @param jobs  the jobs, in order
     * @param label what the progress bar shows for a finished job
     * @param work  the work of one job
     * @param bar   the progress bar (started and finished here)
     * @param <J>   job type
     * @param <R>   result type
     * @return one outcome per job, in the jobs' order
     */
    static <J, R> List<Outcome<J, R>> run(List<J> jobs, java.util.function.Function<J, String> label, Work<J, R> work,
                                          ProgressBar bar) {
        bar.start();
        List<Outcome<J, R>> outcomes = new ArrayList<>();
        if (jobs.size() == 1) {
            outcomes.add(one(jobs.get(0), label, work, bar));
            bar.finish();
            return outcomes;
        }
        int threads = Math.min(jobs.size(), Runtime.getRuntime().availableProcessors());
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "startransport-profile");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Outcome<J, R>>> futures = new ArrayList<>();
            for (J job : jobs) {
                futures.add(pool.submit(() -> one(job, label, work, bar)));
            }
            for (Future<Outcome<J, R>> f : futures) {
                outcomes.add(f.get());
            }
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } finally {
            pool.shutdownNow();
            awaitQuietly(pool);
            bar.finish();
        }
        return outcomes;
    }

    private static <J, R> Outcome<J, R> one(J job, java.util.function.Function<J, String> label, Work<J, R> work,
                                            ProgressBar bar) {
        List<String> notes = new ArrayList<>();
        try {
            R result = work.run(job, notes);
            return new Outcome<>(job, result, null, notes);
        } catch (TransportException | BadInputException | UsageException | UncheckedIOException e) {
            return new Outcome<>(job, null, e, notes);
        } catch (IOException e) {
            return new Outcome<>(job, null, new UncheckedIOException(e), notes);
        } catch (IllegalStateException e) {
            if (e.getCause() instanceof OutOfMemoryError oom) {
                throw oom;
            }
            return new Outcome<>(job, null, e, notes);
        } catch (RuntimeException e) {
            return new Outcome<>(job, null, e, notes);
        } finally {
            bar.step(label.apply(job));
        }
    }

    /** Waits for cancelled tasks to stop writing, so that a staging folder can be deleted whole. */
    private static void awaitQuietly(ExecutorService pool) {
        try {
            pool.awaitTermination(2, TimeUnit.MINUTES);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
