package io.github.startransport.core.checks;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.lang.annotation.Annotation;
import java.lang.reflect.AnnotatedElement;
import java.lang.reflect.Method;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * Every test method of transport-core carries exactly one check kind ({@link CheckKind}). The compiled
 * test classes are scanned by reflection, so a new test class is covered without being listed. The test
 * prints the split, the figure the project watches:
 * {@code mvn -B -pl transport-core -am test -Dtest=CheckKindCoverageTest -Dsurefire.failIfNoSpecifiedTests=false}.
 */
class CheckKindCoverageTest {
    /** Annotations that make a method a test for JUnit Jupiter or jqwik. */
    private static final Set<String> TEST_ANNOTATIONS = Set.of(
            "org.junit.jupiter.api.Test", "org.junit.jupiter.api.RepeatedTest", "org.junit.jupiter.api.TestFactory",
            "org.junit.jupiter.api.TestTemplate", "org.junit.jupiter.params.ParameterizedTest",
            "net.jqwik.api.Property", "net.jqwik.api.Example");
    private static final Set<String> KINDS = Set.of(CheckKind.EXTERNAL, CheckKind.LAW, CheckKind.INTERNAL);

    /** The tag values on one element: JUnit's and jqwik's {@code @Tag}, single or repeated. */
    static List<String> tags(AnnotatedElement element) {
        List<String> out = new ArrayList<>();
        for (Annotation a : element.getAnnotations()) {
            String type = a.annotationType().getName();
            try {
                if (type.equals("org.junit.jupiter.api.Tag") || type.equals("net.jqwik.api.Tag")) {
                    out.add((String) a.annotationType().getMethod("value").invoke(a));
                } else if (type.equals("org.junit.jupiter.api.Tags") || type.equals("net.jqwik.api.Tags")) {
                    for (Annotation inner : (Annotation[]) a.annotationType().getMethod("value").invoke(a)) {
                        out.add((String) inner.annotationType().getMethod("value").invoke(inner));
                    }
                }
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException("cannot read " + type + " on " + element, e);
            }
        }
        return out;
    }

    /** The check kinds that apply to a method: its own tags and those of its class and enclosing classes. */
    static List<String> kinds(Method m) {
        List<String> all = new ArrayList<>(tags(m));
        for (Class<?> c = m.getDeclaringClass(); c != null; c = c.getEnclosingClass()) {
            all.addAll(tags(c));
        }
        return all.stream().filter(KINDS::contains).toList();
    }

    static boolean isTest(Method m) {
        for (Annotation a : m.getAnnotations()) {
            if (TEST_ANNOTATIONS.contains(a.annotationType().getName())) {
                return true;
            }
        }
        return false;
    }

    /** Every class compiled into this module's test output folder. */
    static List<Class<?>> testClasses() throws IOException, URISyntaxException, ClassNotFoundException {
        Path root = Path.of(CheckKind.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        List<Class<?>> classes = new ArrayList<>();
        List<Path> files;
        try (Stream<Path> walk = Files.walk(root)) {
            files = walk.filter(p -> p.toString().endsWith(".class")).sorted().toList();
        }
        for (Path p : files) {
            String name = root.relativize(p).toString().replace(p.getFileSystem().getSeparator(), ".");
            name = name.substring(0, name.length() - ".class".length());
            if (name.endsWith("module-info") || name.endsWith("package-info")) {
                continue;
            }
            classes.add(Class.forName(name, false, CheckKindCoverageTest.class.getClassLoader()));
        }
        return classes;
    }

    @Test
    @Tag(CheckKind.INTERNAL)
    void everyTestMethodHasExactlyOneCheckKind() throws Exception {
        Map<String, Integer> counts = new TreeMap<>();
        Set<String> wrong = new TreeSet<>();
        int total = 0;
        boolean sawSelf = false;
        for (Class<?> c : testClasses()) {
            for (Method m : c.getDeclaredMethods()) {
                if (!isTest(m)) {
                    continue;
                }
                total++;
                sawSelf |= m.getName().equals("everyTestMethodHasExactlyOneCheckKind");
                List<String> k = kinds(m);
                if (k.size() != 1) {
                    wrong.add(c.getName() + "#" + m.getName() + " " + k);
                } else {
                    counts.merge(k.get(0), 1, Integer::sum);
                }
            }
        }
        assertTrue(sawSelf, "the scan must find this test itself");
        assertTrue(total > 250, "only " + total + " test methods found: is the scan looking in the right folder?");
        if (!wrong.isEmpty()) {
            fail(wrong.size() + " test methods without exactly one of @Tag(\"external\"), @Tag(\"law\"), "
                    + "@Tag(\"internal\") (see CheckKind):\n  " + String.join("\n  ", wrong));
        }
        int external = counts.getOrDefault(CheckKind.EXTERNAL, 0);
        int law = counts.getOrDefault(CheckKind.LAW, 0);
        int internal = counts.getOrDefault(CheckKind.INTERNAL, 0);
        assertEquals(total, external + law + internal);
        System.out.printf("transport-core test methods: %d; external %d (%.1f %%), law %d (%.1f %%), internal %d (%.1f %%);"
                        + " external + law %.1f %%%n", total, external, 100.0 * external / total, law,
                100.0 * law / total, internal, 100.0 * internal / total, 100.0 * (external + law) / total);
    }

    // ---- the tag reader on methods that are not tests ----

    @Tag(CheckKind.EXTERNAL)
    void oneJunitTag() {
    }

    @net.jqwik.api.Tag(CheckKind.LAW)
    void oneJqwikTag() {
    }

    @Tag(CheckKind.LAW)
    @Tag(CheckKind.INTERNAL)
    void twoKinds() {
    }

    @Tag("slow")
    void noKind() {
    }

    @Test
    @Tag(CheckKind.INTERNAL)
    void theTagReaderSeesBothTagTypesAndRepeatedTags() throws Exception {
        assertEquals(List.of(CheckKind.EXTERNAL), kinds(getClass().getDeclaredMethod("oneJunitTag")));
        assertEquals(List.of(CheckKind.LAW), kinds(getClass().getDeclaredMethod("oneJqwikTag")));
        assertEquals(2, kinds(getClass().getDeclaredMethod("twoKinds")).size());
        assertEquals(List.of(), kinds(getClass().getDeclaredMethod("noKind")));
        assertTrue(!isTest(getClass().getDeclaredMethod("noKind")));
        assertTrue(isTest(getClass().getDeclaredMethod("everyTestMethodHasExactlyOneCheckKind")));
    }
}
