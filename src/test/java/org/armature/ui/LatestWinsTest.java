package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Coalescing with a hand-stepped executor: nothing runs until the test runs the queued task. */
class LatestWinsTest {

    private final Deque<Runnable> queue = new ArrayDeque<>();
    private final List<Integer> ran = new ArrayList<>();

    @Test
    @DisplayName("of a burst submitted before the worker runs, only the latest job runs, from one queued task")
    void burstRunsLatestOnly() {
        LatestWins w = new LatestWins(queue::add);
        for (int i = 1; i <= 5; i++) {
            int n = i;
            w.submit(() -> ran.add(n));
        }
        assertEquals(1, queue.size(), "one drain task, never a backlog");
        queue.poll().run();
        assertEquals(List.of(5), ran);
        assertFalse(w.hasPending());
        assertTrue(queue.isEmpty());
    }

    @Test
    @DisplayName("jobs submitted while one runs are coalesced and the latest runs right after it")
    void submittedWhileRunning() {
        LatestWins w = new LatestWins(queue::add);
        w.submit(() -> {
            ran.add(1);
            for (int i = 2; i <= 4; i++) {
                int n = i;
                w.submit(() -> ran.add(n));
            }
            assertEquals(0, queue.size(), "the running drain takes them; no second task is queued");
        });
        queue.poll().run();
        assertEquals(List.of(1, 4), ran);
        assertTrue(queue.isEmpty());
    }

    @Test
    @DisplayName("after the worker finishes, a new job queues a new task")
    void laterJobRuns() {
        LatestWins w = new LatestWins(queue::add);
        w.submit(() -> ran.add(1));
        queue.poll().run();
        w.submit(() -> ran.add(2));
        assertEquals(1, queue.size());
        queue.poll().run();
        assertEquals(List.of(1, 2), ran);
    }

    @Test
    @DisplayName("a negative settle time is refused")
    void negativeSettle() {
        assertThrows(IllegalArgumentException.class, () -> new LatestWins(queue::add, -1));
    }
}
