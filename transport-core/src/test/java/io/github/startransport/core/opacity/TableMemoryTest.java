package io.github.startransport.core.opacity;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.ArrayDeque;
import java.util.Collections;
import java.util.Deque;
import java.util.IdentityHashMap;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Measures what a loaded table set holds by walking its object graph, instead of trusting its own
 * accounting. The rule (common practice, no source): every primitive number reachable from the set through
 * the fields of this package's classes and their arrays is counted once (shared arrays, e.g. axes common to
 * all tables, once), in units of one double = 8 bytes: a double or long counts 1, an int or float 1/2.
 * Object headers, references and strings (the source name) are left out: they depend on the JVM and do not
 * grow with the table.
 */
class TableMemoryTest {

    /** @return doubles' worth of primitive data reachable from root */
    static double measure(Object root) throws IllegalAccessException {
        Set<Object> seen = Collections.newSetFromMap(new IdentityHashMap<>());
        Deque<Object> todo = new ArrayDeque<>();
        todo.push(root);
        double n = 0;
        while (!todo.isEmpty()) {
            Object o = todo.pop();
            if (!seen.add(o)) {
                continue;
            }
            Class<?> c = o.getClass();
            if (c == double[].class) {
                n += ((double[]) o).length;
            } else if (c == long[].class) {
                n += ((long[]) o).length;
            } else if (c == int[].class) {
                n += ((int[]) o).length / 2.0;
            } else if (c == float[].class) {
                n += ((float[]) o).length / 2.0;
            } else if (c.isArray() && !c.getComponentType().isPrimitive()) {
                for (Object e : (Object[]) o) {
                    if (e != null) {
                        todo.push(e);
                    }
                }
            } else if (c.getPackageName().equals(OpacityTableSet.class.getPackageName())) {
                for (Field f : c.getDeclaredFields()) {
                    if (Modifier.isStatic(f.getModifiers())) {
                        continue;
                    }
                    f.setAccessible(true);
                    Class<?> t = f.getType();
                    if (t == double.class || t == long.class) {
                        n += 1;
                    } else if (t == int.class || t == float.class) {
                        n += 0.5;
                    } else if (!t.isPrimitive()) {
                        Object v = f.get(o);
                        if (v != null) {
                            todo.push(v);
                        }
                    }
                }
            }
        }
        return n;
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void demoSetHoldsFourDoublesPerValueAndOneCopyOfTheNodes() throws IllegalAccessException {
        OpacityTableSet set = DemoTable.set();
        long values = set.tabulatedValues();
        long axes = 101 + 81;                 // the demo grid's log T and log R nodes
        long compositions = 2L * set.tableCount();
        long raw = values + axes + compositions;
        double held = measure(set);
        System.out.printf("demo table set, measured: %d log kappa values, %.1f doubles held (%.4f x values, %.4f x raw)"
                + "; own accounting %d%n", values, held, held / values, held / raw, set.heldDoubles());
        // bicubic Hermite needs f, f_x, f_y, f_xy per node; what comes on top must stay small (axes, weights)
        assertTrue(held <= 4.0 * raw, "held " + held + " doubles for " + raw + " raw");
        assertTrue(held - 4.0 * values < 0.01 * values, "node data held more than once: " + held);
        assertTrue(held >= set.heldDoubles(), "own accounting " + set.heldDoubles() + " above the measured " + held);
    }

    @Tag(CheckKind.INTERNAL)
    @Test
    void aSetOfTablesWithOwnAxesHoldsEachTableOnce() throws IllegalAccessException {
        // the general path: tables on different axes, each keeps its own node data
        java.util.List<OpacityGrid> grids = new java.util.ArrayList<>();
        grids.add(Grids.grid(0.0, 0.02, Grids.uniform(4, 6, 21), Grids.uniform(-4, 0, 17), (x, y) -> x + y));
        grids.add(Grids.grid(0.7, 0.02, Grids.nonUniform(4, 6, 19, 3), Grids.uniform(-4, 0, 17), (x, y) -> x - y));
        OpacityTableSet set = new OpacityTableSet("two", grids, true);
        long values = set.tabulatedValues();
        double held = measure(set);
        // a second copy of the nodes would make it 8 per value; small tables carry relatively more axis data
        assertTrue(held < 5.0 * values, "held " + held + " for " + values + " values");
        assertTrue(held >= 4.0 * values, "held " + held + " cannot be below 4 per node");
    }
}
