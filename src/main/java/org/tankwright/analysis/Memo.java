package org.tankwright.analysis;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * A small cache of the last few values of a pure function of an immutable key (a coil's geometry,
 * a pair of coils): the window analyses the design again on every keystroke, and most edits leave
 * the coils as they were. Keys must be values (records) whose equality means "same input"; values
 * must be immutable. Thread-safe; the function runs outside the lock, so two threads may compute
 * the same value once each, and either result is kept (they are equal).
 *
 * @param <K> the input
 * @param <V> the function's value
 */
final class Memo<K, V> {
    private final int capacity;
    private final Map<K, V> recent;

    Memo(int capacity) {
        this.capacity = capacity;
        this.recent = new LinkedHashMap<>(16, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<K, V> eldest) {
                return size() > Memo.this.capacity;
            }
        };
    }

    /** The value for {@code key}, computed by {@code f} unless one of the last few keys was equal. */
    V get(K key, Function<? super K, ? extends V> f) {
        synchronized (recent) {
            V v = recent.get(key);
            if (v != null) {
                return v;
            }
        }
        V v = f.apply(key);
        synchronized (recent) {
            recent.put(key, v);
        }
        return v;
    }
}
