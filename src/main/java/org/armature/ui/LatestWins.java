package org.armature.ui;

import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Coalesces background jobs: of the jobs submitted while one runs, only the latest runs next; the
 * others are dropped. At most one job runs at a time and at most one drain task is queued on the
 * executor, so a burst of edits (a slider drag) costs one solve per finished solve, never a backlog.
 *
 * <p>An optional settle time makes it a debouncer as well: the worker waits that long before taking
 * a job, so a job superseded within the settle time never starts. Zero (the default for the live
 * readouts) takes each job at once.
 *
 * <p>Thread-safe: {@link #submit} may be called from any thread.
 */
public final class LatestWins {

    private final Executor executor;
    private final long settleMillis;
    private final AtomicReference<Runnable> pending = new AtomicReference<>();
    private final AtomicBoolean draining = new AtomicBoolean();

    /**
     * @param executor where jobs run (a background thread in the application, a same-thread or
     *     hand-stepped executor in tests)
     * @param settleMillis how long the worker waits for a newer job before taking one, ms, ≥ 0
     */
    public LatestWins(Executor executor, long settleMillis) {
        if (settleMillis < 0) {
            throw new IllegalArgumentException("settleMillis must not be negative, was " + settleMillis);
        }
        this.executor = executor;
        this.settleMillis = settleMillis;
    }

    /** A coalescer that takes each job at once. */
    public LatestWins(Executor executor) {
        this(executor, 0);
    }

    /** Makes {@code job} the next one to run, replacing any job that has not started. */
    public void submit(Runnable job) {
        pending.set(job);
        if (draining.compareAndSet(false, true)) {
            executor.execute(this::drain);
        }
    }

    /** True when a job is waiting to start. */
    public boolean hasPending() {
        return pending.get() != null;
    }

    private void drain() {
        try {
            while (true) {
                settle();
                Runnable job = pending.getAndSet(null);
                if (job == null) {
                    break;
                }
                job.run();
            }
        } finally {
            draining.set(false);
        }
        // a job submitted between the last take and the flag being cleared must not be stranded
        if (pending.get() != null && draining.compareAndSet(false, true)) {
            executor.execute(this::drain);
        }
    }

    private void settle() {
        if (settleMillis == 0) {
            return;
        }
        try {
            Thread.sleep(settleMillis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
