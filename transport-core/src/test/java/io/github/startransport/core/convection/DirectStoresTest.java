package io.github.startransport.core.convection;

import org.junit.jupiter.api.Test;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.DoubleBuffer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

/**
 * The stores straight into a direct buffer's memory land where the buffer's own reads find them,
 * and only buffers where a plain store equals the buffer's put get an address.
 */
class DirectStoresTest {

    private static DoubleBuffer direct(int length, ByteOrder order) {
        return ByteBuffer.allocateDirect(length * Double.BYTES).order(order).asDoubleBuffer();
    }

    @Test
    void storesAreReadBackByTheBuffer() {
        if (Runtime.version().feature() >= 24) {
            return; // the buffer's own puts are used there: nothing of this class runs
        }
        DoubleBuffer buffer = direct(100, ByteOrder.nativeOrder());
        long address = DirectStores.address(buffer);
        assertNotEquals(0L, address, "a direct native-order buffer gets its address");
        for (int i = 0; i < 100; i++) {
            DirectStores.put(address, i, i * 1.5 - 7.0);
        }
        for (int i = 0; i < 100; i++) {
            assertEquals(i * 1.5 - 7.0, buffer.get(i), "element " + i);
        }
        // a view from an offset: element 0 of the view is element 10 of the whole
        ByteBuffer whole = ByteBuffer.allocateDirect(100 * Double.BYTES).order(ByteOrder.nativeOrder());
        DoubleBuffer view = whole.position(10 * Double.BYTES).slice().order(ByteOrder.nativeOrder()).asDoubleBuffer();
        DirectStores.put(DirectStores.address(view), 0, 42.0);
        assertEquals(42.0, whole.getDouble(10 * Double.BYTES));
    }

    @Test
    void onlyDirectWritableNativeOrderBuffersGetAnAddress() {
        ByteOrder other = ByteOrder.nativeOrder() == ByteOrder.LITTLE_ENDIAN ? ByteOrder.BIG_ENDIAN
                : ByteOrder.LITTLE_ENDIAN;
        assertEquals(0L, DirectStores.address(DoubleBuffer.allocate(10)), "heap buffer");
        assertEquals(0L, DirectStores.address(direct(10, other)), "other byte order");
        assertEquals(0L, DirectStores.address(direct(10, ByteOrder.nativeOrder()).asReadOnlyBuffer()), "read-only");
    }
}
