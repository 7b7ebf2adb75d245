package io.github.startransport.cli;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * All-or-nothing output: files are written into a hidden temporary sibling of the target
 * folder, which is renamed onto the target only when everything has been written. Closing
 * without {@link #commit()} deletes the temporary folder (and any parent folders this object
 * created), so the target is left exactly as it was.
 *
 * <p>An existing target is replaced only when it holds nothing but files this tool writes (a
 * previous run's output); otherwise it is refused, so no one's other files are ever deleted.
 */
final class OutputFolder implements AutoCloseable {
    /** The names of the files one diagnosis writes. */
    static final Set<String> OUR_FILES = Set.of("zones.csv", "summary.json", DiagnosisCharts.GRADIENTS_PNG,
            DiagnosisCharts.MIXING_PNG, DiagnosisCharts.OPACITY_PNG, DiagnosisCharts.PROPAGATION_PNG);

    private final Path target;
    private final Path staging;
    private final List<Path> createdParents;
    private boolean committed;

    private OutputFolder(Path target, Path staging, List<Path> createdParents) {
        this.target = target;
        this.staging = staging;
        this.createdParents = createdParents;
    }

    /**
     * @param target the folder the output should end up in
     * @return a fresh, empty staging folder beside it
     * @throws BadInputException when the target cannot be written or holds other files
     */
    static OutputFolder open(Path target) {
        Path t = target.toAbsolutePath().normalize();
        if (Files.exists(t, LinkOption.NOFOLLOW_LINKS)) {
            if (!Files.isDirectory(t)) {
                throw new BadInputException("cannot write the output folder " + target + ": it exists and is not a"
                        + " folder; choose another --out");
            }
            List<Path> foreign = foreignEntries(t);
            if (!foreign.isEmpty()) {
                throw new BadInputException("the output folder " + target + " already holds files this tool did not"
                        + " write (" + foreign.get(0).getFileName() + (foreign.size() > 1 ? ", ..." : "")
                        + "); choose another --out, or empty it");
            }
        }
        Path parent = t.getParent();
        List<Path> created = new ArrayList<>();
        for (Path p = parent; p != null && !Files.exists(p); p = p.getParent()) {
            created.add(0, p);
        }
        try {
            for (Path p : created) {
                Files.createDirectory(p);
            }
        } catch (IOException e) {
            deleteCreated(created);
            throw new BadInputException("cannot create the output folder " + target + ": " + reason(e, parent), e);
        }
        if (!Files.isDirectory(parent)) {
            throw new BadInputException("cannot create the output folder " + target + ": " + parent
                    + " is not a folder");
        }
        try {
            Path staging = freshSibling(t, ".partial-");
            Files.createDirectory(staging);
            return new OutputFolder(t, staging, created);
        } catch (IOException e) {
            deleteCreated(created);
            throw new BadInputException("cannot write the output folder " + target + ": " + reason(e, parent), e);
        }
    }

    /**
     * A hidden, unused name beside the target. (Not {@code Files.createTempDirectory}: its folders
     * are private to the owner, and the staging folder becomes the output folder.)
     */
    private static Path freshSibling(Path target, String kind) {
        java.util.concurrent.ThreadLocalRandom random = java.util.concurrent.ThreadLocalRandom.current();
        while (true) {
            Path p = target.resolveSibling("." + target.getFileName() + kind + Long.toUnsignedString(random.nextLong(), 36));
            if (!Files.exists(p, LinkOption.NOFOLLOW_LINKS)) {
                return p;
            }
        }
    }

    private static String reason(IOException e, Path parent) {
        for (Path p = parent; p != null; p = p.getParent()) {
            if (Files.exists(p) && !Files.isDirectory(p)) {
                return p + " is a file, not a folder";
            }
        }
        return e.getClass().getSimpleName() + (e.getMessage() == null ? "" : " " + e.getMessage());
    }

    /** Entries of an existing folder that a run of this tool would not have written. */
    private static List<Path> foreignEntries(Path dir) {
        List<Path> foreign = new ArrayList<>();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(dir)) {
            for (Path e : entries) {
                if (Files.isDirectory(e, LinkOption.NOFOLLOW_LINKS)) {
                    try (DirectoryStream<Path> inner = Files.newDirectoryStream(e)) {
                        for (Path f : inner) {
                            if (!isOurs(f)) {
                                foreign.add(f);
                            }
                        }
                    }
                } else if (!isOurs(e)) {
                    foreign.add(e);
                }
            }
        } catch (IOException e) {
            throw new BadInputException("cannot read the output folder " + dir + ": " + e.getMessage(), e);
        }
        return foreign;
    }

    private static boolean isOurs(Path f) {
        return Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS) && OUR_FILES.contains(f.getFileName().toString());
    }

    /** @return the staging folder to write into */
    Path staging() {
        return staging;
    }

    /** @return the final folder */
    Path target() {
        return target;
    }

    /**
     * Moves the staging folder onto the target, replacing a previous run's output.
     *
     * @throws IOException when the rename fails (the target is then left as it was)
     */
    void commit() throws IOException {
        if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            Path old = freshSibling(target, ".old-");
            Files.move(target, old, StandardCopyOption.ATOMIC_MOVE);
            try {
                Files.move(staging, target, StandardCopyOption.ATOMIC_MOVE);
            } catch (IOException e) {
                Files.move(old, target, StandardCopyOption.ATOMIC_MOVE);
                throw e;
            }
            committed = true;
            deleteTree(old);
        } else {
            Files.move(staging, target, StandardCopyOption.ATOMIC_MOVE);
            committed = true;
        }
    }

    /** Deletes the staging folder unless it was committed. */
    @Override
    public void close() {
        if (!committed) {
            try {
                deleteTree(staging);
            } catch (IOException e) {
                // nothing more can be done; the hidden folder's name says what it is
            }
            deleteCreated(createdParents);
        }
    }

    private static void deleteCreated(List<Path> created) {
        for (int i = created.size() - 1; i >= 0; i--) {
            try {
                Files.deleteIfExists(created.get(i));
            } catch (IOException e) {
                return;
            }
        }
    }

    static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                if (exc != null) {
                    throw exc;
                }
                Files.delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
