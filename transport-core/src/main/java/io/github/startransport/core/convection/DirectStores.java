package io.github.startransport.core.convection;

import java.lang.reflect.Field;
import java.nio.Buffer;
import java.nio.ByteOrder;
import java.nio.DoubleBuffer;

/**
 * Stores into the memory of a direct buffer without going through the buffer's own put, whose
 * per-store checks cost about a third of the zone-major kernel's time when it writes the Jacobian
 * into memory outside the Java heap (a native host's array). Uses {@code sun.misc.Unsafe} (module
 * {@code jdk.unsupported}, which needs no flag in Java 17); only for buffers where a plain store is
 * exactly what the buffer's put would do: direct, writable, in the platform's byte order, and not
 * a view of a memory segment (whose lifetime checks must stay). Every other buffer, and every
 * buffer on Java 24 or newer (where these methods of Unsafe print a warning), goes through the
 * buffer's put.
 *
 * <p>Bounds: the caller checks once, before the first store, that every index it will write lies
 * below the buffer's limit (which is at most its capacity, the size of its memory), and keeps the
 * buffer reachable until the last store ({@link java.lang.ref.Reference#reachabilityFence}).
 */
final class DirectStores {
    private DirectStores() {
    }

    private static final sun.misc.Unsafe UNSAFE;
    private static final long ADDRESS;
    private static final long SEGMENT;

    static {
        sun.misc.Unsafe unsafe = null;
        long address = -1;
        long segment = -1;
        if (Runtime.version().feature() < 24) {
            try {
                Field field = sun.misc.Unsafe.class.getDeclaredField("theUnsafe");
                field.setAccessible(true);
                unsafe = (sun.misc.Unsafe) field.get(null);
                address = unsafe.objectFieldOffset(Buffer.class.getDeclaredField("address"));
                segment = unsafe.objectFieldOffset(Buffer.class.getDeclaredField("segment"));
            } catch (ReflectiveOperationException | RuntimeException e) {
                unsafe = null;
            }
        }
        UNSAFE = unsafe;
        ADDRESS = address;
        SEGMENT = segment;
    }

    /**
     * @param buffer a buffer the caller will write
     * @return the address of the buffer's element 0, or 0 when the stores must go through the buffer
     */
    static long address(DoubleBuffer buffer) {
        if (UNSAFE == null || !buffer.isDirect() || buffer.isReadOnly() || buffer.order() != ByteOrder.nativeOrder()
                || UNSAFE.getObject(buffer, SEGMENT) != null) {
            return 0L;
        }
        return UNSAFE.getLong(buffer, ADDRESS);
    }

    /**
     * Stores a double at an index of a buffer's memory.
     *
     * @param address from {@link #address}, not 0
     * @param index   element index, checked by the caller to lie below the buffer's limit
     * @param value   the value
     */
    static void put(long address, int index, double value) {
        UNSAFE.putDouble(address + ((long) index << 3), value);
    }
}
