package riffle.phrases;

import java.util.Arrays;

/**
 * An open-addressing hash map from {@code long} keys to non-negative {@code int} values, for the
 * hot loops of the miner (no boxing, one array probe per lookup). Not thread-safe.
 */
final class LongIntMap {
  static final int MISSING = -1;
  private static final long FREE = Long.MIN_VALUE;

  private long[] keys;
  private int[] values;
  private int size;
  private int mask;

  LongIntMap(int expected) {
    int capacity = Integer.highestOneBit(Math.max(16, expected * 2) - 1) << 1;
    keys = new long[capacity];
    values = new int[capacity];
    Arrays.fill(keys, FREE);
    mask = capacity - 1;
  }

  /** The value for {@code key}, or {@link #MISSING}. */
  int get(long key) {
    int i = slot(key);
    while (true) {
      long k = keys[i];
      if (k == key) {
        return values[i];
      }
      if (k == FREE) {
        return MISSING;
      }
      i = (i + 1) & mask;
    }
  }

  /** Stores {@code value} under {@code key} (which must not be {@code Long.MIN_VALUE}). */
  void put(long key, int value) {
    int i = slot(key);
    while (true) {
      long k = keys[i];
      if (k == key) {
        values[i] = value;
        return;
      }
      if (k == FREE) {
        keys[i] = key;
        values[i] = value;
        if (++size * 2 > keys.length) {
          grow();
        }
        return;
      }
      i = (i + 1) & mask;
    }
  }

  /** Adds one to the value under {@code key} (absent counts as zero). */
  void increment(long key) {
    int i = slot(key);
    while (true) {
      long k = keys[i];
      if (k == key) {
        values[i]++;
        return;
      }
      if (k == FREE) {
        keys[i] = key;
        values[i] = 1;
        if (++size * 2 > keys.length) {
          grow();
        }
        return;
      }
      i = (i + 1) & mask;
    }
  }

  private int slot(long key) {
    long h = key * 0x9E3779B97F4A7C15L;
    return (int) (h ^ (h >>> 32)) & mask;
  }

  private void grow() {
    long[] oldKeys = keys;
    int[] oldValues = values;
    keys = new long[oldKeys.length * 2];
    values = new int[oldKeys.length * 2];
    Arrays.fill(keys, FREE);
    mask = keys.length - 1;
    size = 0;
    for (int i = 0; i < oldKeys.length; i++) {
      if (oldKeys[i] != FREE) {
        put(oldKeys[i], oldValues[i]);
      }
    }
  }
}
