package org.armature.cli;

import java.io.PrintWriter;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Supplier;

/**
 * Runs a long calculation and, while it runs longer than {@value #FIRST_NOTE_SECONDS} s, says so on
 * the error stream every {@value #NOTE_EVERY_SECONDS} s, so standard output (and {@code --json})
 * stays exactly the result.
 */
final class Progress {

    /** Seconds of quiet before the first note. */
    static final long FIRST_NOTE_SECONDS = 2;
    /** Seconds between notes. */
    static final long NOTE_EVERY_SECONDS = 5;

    private Progress() {
    }

    /**
     * @param work the calculation
     * @param err where the notes go
     * @param command the command's name, starting each note
     * @param what what is being done, for the note ("100,000 Monte Carlo samples"); may be empty
     * @return the calculation's result; its exceptions pass through unchanged
     */
    static <T> T run(Supplier<T> work, PrintWriter err, String command, String what) {
        return run(work, err, command, what, TimeUnit.SECONDS.toMillis(FIRST_NOTE_SECONDS),
                TimeUnit.SECONDS.toMillis(NOTE_EVERY_SECONDS));
    }

    /** As {@link #run(Supplier, PrintWriter, String, String)} with the delays given (tests), ms. */
    static <T> T run(Supplier<T> work, PrintWriter err, String command, String what, long firstMillis,
                     long everyMillis) {
        ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "armature-" + command);
            t.setDaemon(true);
            return t;
        });
        try {
            Future<T> f = worker.submit(work::get);
            long started = System.nanoTime();
            long wait = firstMillis;
            while (true) {
                try {
                    return f.get(wait, TimeUnit.MILLISECONDS);
                } catch (TimeoutException e) {
                    long seconds = TimeUnit.NANOSECONDS.toSeconds(System.nanoTime() - started);
                    err.println(command + ": still working after " + seconds + " s"
                            + (what.isEmpty() ? "" : " (" + what + ")") + "…");
                    err.flush();
                    wait = everyMillis;
                }
            }
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error x) {
                throw x;
            }
            throw new CommandFailedException("The calculation failed: " + cause.getMessage(), cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CommandFailedException("The calculation was interrupted.", e);
        } finally {
            worker.shutdownNow();
        }
    }
}
