package dev.tether.cli;

import com.sun.management.GarbageCollectionNotificationInfo;

import javax.management.ListenerNotFoundException;
import javax.management.Notification;
import javax.management.NotificationEmitter;
import javax.management.NotificationListener;
import javax.management.openmbean.CompositeData;
import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.MemoryUsage;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.atomic.AtomicLong;

/**
 * The most this process's heap held at one instant while it was watched, from the collector's own reports: the
 * heap pools together right before each collection (where the heap peaks) and right after it (what the work
 * needed, the garbage the collection reclaimed left out). A sum of each pool's own peak would add the peaks of
 * different moments and can exceed {@code -Xmx}; the non-heap pools (metaspace, code cache) are left out, since
 * {@code -Xmx} and an executor's memory setting do not bound them. Thread-safe.
 */
public final class HeapPeak implements AutoCloseable {
    private final Set<String> heapPools = new HashSet<>();
    private final AtomicLong beforeCollection = new AtomicLong();
    private final AtomicLong afterCollection = new AtomicLong();
    private final List<NotificationEmitter> watched = new ArrayList<>();
    private final NotificationListener listener = this::collected;

    private HeapPeak() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) heapPools.add(pool.getName());
        }
        for (GarbageCollectorMXBean gc : ManagementFactory.getGarbageCollectorMXBeans()) {
            if (gc instanceof NotificationEmitter emitter) {
                emitter.addNotificationListener(listener, null, null);
                watched.add(emitter);
            }
        }
    }

    /** Starts watching the heap. */
    public static HeapPeak start() {
        return new HeapPeak();
    }

    /** The most the heap held, in bytes: before any collection so far, or now if that is more. */
    public long peakBytes() {
        return Math.max(beforeCollection.get(), ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed());
    }

    /** The most the heap held right after a collection, in bytes (0 before the first collection). */
    public long peakAfterCollectionBytes() {
        return afterCollection.get();
    }

    private void collected(Notification n, Object handback) {
        if (!GarbageCollectionNotificationInfo.GARBAGE_COLLECTION_NOTIFICATION.equals(n.getType())) return;
        GarbageCollectionNotificationInfo info = GarbageCollectionNotificationInfo.from((CompositeData) n.getUserData());
        beforeCollection.accumulateAndGet(heapUsed(info.getGcInfo().getMemoryUsageBeforeGc()), Math::max);
        afterCollection.accumulateAndGet(heapUsed(info.getGcInfo().getMemoryUsageAfterGc()), Math::max);
    }

    private long heapUsed(Map<String, MemoryUsage> pools) {
        long used = 0;
        for (Map.Entry<String, MemoryUsage> e : pools.entrySet()) {
            if (heapPools.contains(e.getKey())) used += e.getValue().getUsed();
        }
        return used;
    }

    /** Stops watching. */
    @Override
    public void close() {
        for (NotificationEmitter e : watched) {
            try {
                e.removeNotificationListener(listener);
            } catch (ListenerNotFoundException ignored) {
                // already removed
            }
        }
        watched.clear();
    }
}
