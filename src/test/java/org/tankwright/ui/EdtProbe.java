package org.tankwright.ui;

import java.awt.AWTEvent;
import java.awt.EventQueue;
import java.awt.Toolkit;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;

/**
 * Measures how long the event thread is kept busy: pushed in front of the system event queue, it
 * times each event's dispatch in CPU time of the event thread (so a loaded test machine that
 * delays the thread does not count as our blocking it), and keeps the worst.
 */
final class EdtProbe extends EventQueue {

    private final ThreadMXBean threads = ManagementFactory.getThreadMXBean();
    private volatile long worstCpuNanos;
    private volatile long events;
    private volatile String worstEvent = "";

    static EdtProbe install() {
        EdtProbe p = new EdtProbe();
        Toolkit.getDefaultToolkit().getSystemEventQueue().push(p);
        return p;
    }

    @Override
    protected void dispatchEvent(AWTEvent event) {
        long t0 = threads.getCurrentThreadCpuTime();
        super.dispatchEvent(event);
        long spent = threads.getCurrentThreadCpuTime() - t0;
        events++;
        if (spent > worstCpuNanos) {
            worstCpuNanos = spent;
            worstEvent = event.toString();
        }
    }

    /** Starts a new measurement. */
    void reset() {
        worstCpuNanos = 0;
        events = 0;
    }

    long worstCpuNanos() {
        return worstCpuNanos;
    }

    /** What the worst event was, for the failure message. */
    String worstEvent() {
        return worstEvent;
    }

    long events() {
        return events;
    }

    void remove() {
        pop();
    }
}
