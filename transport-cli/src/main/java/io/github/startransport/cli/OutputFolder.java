package io.github.startransport.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.locks.ReentrantLock;

/**
 * All-or-nothing, crash-safe output folder.
 *
 * <p><b>Layout.</b> The output folder DIR is a symbolic link to a hidden versioned folder beside
 * it, {@code .DIR.run-<run id>}, which holds the files and a marker file {@value #MARKER} with the
 * run's details (tool, version, run id, start and end, command line, and the list of files the run
 * wrote). Beside them sits an empty lock file {@code .DIR.lock}, kept for good.
 *
 * <p><b>Replacement.</b> A run writes everything into its own versioned folder, then, holding
 * the lock file's lock ({@link FileChannel#lock()}): checks that DIR is still absent or still a
 * link this tool made, completes the marker, makes a new link {@code .DIR.link-<run id>} and
 * renames it over DIR. rename(2) replaces a link atomically, so DIR is at every instant the old
 * result or the new one, never absent, whatever is killed when, and with any number of runs
 * committing at once (the last one wins; each one's output is whole). The old versioned folder
 * is removed after the lock is released; if that fails the run still succeeded and the leftover
 * is reported ({@link #commit()} returns the warning).
 *
 * <p><b>What may be replaced.</b> Only a link this tool made: its target is a single name
 * {@code .DIR.run-<id>} beside it, holding a marker with that run id, and nothing but the files
 * the marker lists. Anything else (a real folder, a file, a folder with someone's own files in
 * it) is refused before anything is written, and again at commit. A symbolic link someone else
 * made is followed: the output goes where it points, by the same rules, and the link itself is
 * left alone.
 *
 * <p><b>Clean-up.</b> Every run, at start and holding the lock, removes what crashed runs left
 * behind: versioned folders that DIR does not point to and whose marker no live run holds locked
 * (each run locks its own marker until it ends; the operating system releases the lock of a
 * killed process), and stray links.
 *
 * <p>Where the file system cannot make symbolic links, the run is refused with a message.
 */
final class OutputFolder implements AutoCloseable {
    /** File name of the marker in every versioned folder. */
    static final String MARKER = "startransport-run.json";
    /** Value of the marker's {@code tool} field. */
    static final String TOOL = "startransport";

    /** The steps of a run, in order, for tests that stop or fail a run between two of them. */
    enum Step {
        /** The lock is held at the start of a run. */
        OPEN_LOCKED,
        /** Stale folders of crashed runs are gone. */
        STALE_REMOVED,
        /** The run's own versioned folder and its locked marker exist. */
        RUN_FOLDER_MADE,
        /** The lock is released; the run writes its files. */
        OPEN_UNLOCKED,
        /** The lock is held to commit. */
        COMMIT_LOCKED,
        /** The marker lists the files written. */
        MARKER_WRITTEN,
        /** The new link exists under its temporary name. */
        LINK_MADE,
        /** The new link has replaced DIR: the run is committed. */
        SWAPPED,
        /** The lock is released after the commit. */
        COMMIT_UNLOCKED,
        /** One file or folder is about to be deleted (the path says which). */
        DELETE,
        /** The previous versioned folder is gone. */
        OLD_REMOVED
    }

    /** A hook called before each step; tests use it to stop a run or inject a failure. */
    interface Faults {
        /**
         * @param step the step reached
         * @param path the path it concerns
         * @throws IOException an injected failure
         */
        void at(Step step, Path path) throws IOException;
    }

    private static final Faults NONE = (step, path) -> {
    };

    /** The hook; only tests set it. */
    static volatile Faults faults = NONE;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private static final DateTimeFormatter RUN_TIME = DateTimeFormatter.ofPattern("yyyyMMdd'T'HHmmss")
            .withZone(ZoneOffset.UTC);
    /** In-process locks, one per lock file: {@link FileChannel#lock()} is held per process, not per thread. */
    private static final Map<Path, ReentrantLock> IN_PROCESS = new ConcurrentHashMap<>();

    private final Path requested;
    private final Path place;
    private final Path runFolder;
    private final String runId;
    private final ObjectNode marker;
    private final List<Path> createdParents;
    private FileChannel markerChannel;
    private boolean committed;

    private OutputFolder(Path requested, Path place, Path runFolder, String runId, ObjectNode marker,
                         FileChannel markerChannel, List<Path> createdParents) {
        this.requested = requested;
        this.place = place;
        this.runFolder = runFolder;
        this.runId = runId;
        this.marker = marker;
        this.markerChannel = markerChannel;
        this.createdParents = createdParents;
    }

    /**
     * @param target  the output folder as given ({@code --out})
     * @param command the command line, recorded in the marker
     * @param notes   receives one sentence per stale folder that could not be removed
     * @return a fresh, empty versioned folder to write into
     * @throws BadInputException when the target cannot be written, or exists and is not this tool's
     */
    @SuppressWarnings("try") // the lock is held for the whole block and released by closing it
    static OutputFolder open(Path target, List<String> command, List<String> notes) {
        Path place = resolveUserLinks(target);
        Path name = place.getFileName();
        if (name == null) {
            throw new BadInputException("cannot use " + target + " as the output folder; give a folder name");
        }
        requireReplaceable(target, place);
        Path parent = place.getParent();
        List<Path> created = createParents(target, parent);
        String runId = RUN_TIME.format(Instant.now()) + "-" + Long.toUnsignedString(
                ThreadLocalRandom.current().nextLong(), 36);
        Path runFolder = parent.resolve(runName(place, runId));
        ObjectNode marker = JSON.createObjectNode();
        marker.put("tool", TOOL);
        String version = Main.class.getPackage().getImplementationVersion();
        marker.put("version", version == null ? "development build" : version);
        marker.put("run_id", runId);
        marker.put("started", Instant.now().toString());
        marker.put("state", "writing");
        ArrayNode cmd = marker.putArray("command");
        command.forEach(cmd::add);
        FileChannel channel = null;
        try (GlobalLock lock = GlobalLock.take(place)) {
            step(Step.OPEN_LOCKED, place);
            removeStale(place, notes);
            step(Step.STALE_REMOVED, place);
            Files.createDirectory(runFolder);
            channel = FileChannel.open(runFolder.resolve(MARKER), StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE, StandardOpenOption.READ);
            if (channel.tryLock() == null) {
                throw new IOException("cannot lock " + runFolder.resolve(MARKER));
            }
            write(channel, marker);
            step(Step.RUN_FOLDER_MADE, runFolder);
        } catch (IOException | RuntimeException e) {
            closeQuietly(channel);
            try {
                deleteTree(runFolder);
            } catch (IOException ignored) {
                // the next run removes it
            }
            removeCreated(place, created);
            if (e instanceof BadInputException b) {
                throw b;
            }
            throw new BadInputException("cannot write the output folder " + target + ": " + reason(e, parent), e);
        }
        OutputFolder folder = new OutputFolder(target, place, runFolder, runId, marker, channel, created);
        try {
            step(Step.OPEN_UNLOCKED, runFolder);
        } catch (IOException e) {
            folder.close();
            throw new BadInputException("cannot write the output folder " + target + ": " + reason(e, parent), e);
        }
        return folder;
    }

    /** @return the folder to write into (the run's own versioned folder) */
    Path staging() {
        return runFolder;
    }

    /** @return where the output folder (the link) is, after following links someone else made */
    Path target() {
        return place;
    }

    /**
     * Makes the run's output the output folder, replacing the previous run's.
     *
     * @return warnings about leftovers (the previous output could not be removed); empty when none
     * @throws BadInputException when the output folder changed meanwhile into something this tool
     *                           may not replace, or the commit failed (the previous output is
     *                           then left as it was)
     */
    @SuppressWarnings("try") // the lock is held for the whole block and released by closing it
    List<String> commit() {
        String oldName = null;
        FileChannel oldChannel = null;
        try (GlobalLock lock = GlobalLock.take(place)) {
            step(Step.COMMIT_LOCKED, place);
            requireReplaceable(requested, place);
            oldName = ourTarget(place);
            marker.put("state", "complete");
            marker.put("finished", Instant.now().toString());
            ArrayNode files = marker.putArray("files");
            listFiles(runFolder).forEach(files::add);
            write(markerChannel, marker);
            markerChannel.force(true);
            step(Step.MARKER_WRITTEN, runFolder);
            Path link = place.resolveSibling(linkName(place, runId));
            Files.createSymbolicLink(link, runFolder.getFileName());
            step(Step.LINK_MADE, link);
            Files.move(link, place, StandardCopyOption.ATOMIC_MOVE);
            committed = true;
            step(Step.SWAPPED, place);
            if (oldName != null) {
                oldChannel = lockQuietly(place.resolveSibling(oldName).resolve(MARKER));
            }
        } catch (UnsupportedOperationException e) {
            throw new BadInputException("cannot write the output folder " + requested + ": the file system of "
                    + place.getParent() + " cannot make symbolic links, which this tool uses to replace its output"
                    + " safely; choose an --out on another file system", e);
        } catch (IOException e) {
            if (!committed) {
                throw new BadInputException("cannot write the output folder " + requested + ": "
                        + reason(e, place.getParent()), e);
            }
        }
        List<String> warnings = new ArrayList<>();
        try {
            step(Step.COMMIT_UNLOCKED, place);
        } catch (IOException e) {
            // committed; nothing depends on the notice
        }
        if (oldName != null) {
            Path old = place.resolveSibling(oldName);
            try {
                deleteTree(old);
                step(Step.OLD_REMOVED, old);
            } catch (IOException e) {
                warnings.add("the new output is in place, but the previous one could not be removed ("
                        + reason(e, old) + "); it is left in " + old + " (remove it by hand; the next run into "
                        + requested + " tries again)");
            } finally {
                closeQuietly(oldChannel);
            }
        }
        return warnings;
    }

    /** Removes the run's folder unless it was committed, and releases the run's lock. */
    @Override
    public void close() {
        closeQuietly(markerChannel);
        markerChannel = null;
        if (!committed) {
            try {
                deleteTree(runFolder);
            } catch (IOException e) {
                // the next run into the same folder removes it
            }
            removeCreated(place, createdParents);
        }
    }

    /** Removes the parent folders this run made, with the lock file in the innermost one. */
    private static void removeCreated(Path place, List<Path> created) {
        if (!created.isEmpty()) {
            try {
                Files.deleteIfExists(place.resolveSibling("." + place.getFileName() + ".lock"));
            } catch (IOException e) {
                // then the folders stay
            }
        }
        deleteCreated(created);
    }

    // ---------------------------------------------------------------- names

    private static String runPrefix(Path place) {
        return "." + place.getFileName() + ".run-";
    }

    private static String runName(Path place, String runId) {
        return runPrefix(place) + runId;
    }

    private static String linkPrefix(Path place) {
        return "." + place.getFileName() + ".link-";
    }

    private static String linkName(Path place, String runId) {
        return linkPrefix(place) + runId;
    }

    /**
     * @param place a path
     * @return the name of the versioned folder it points to when it is a link of ours (a single
     *         name of the form {@code .DIR.run-<id>}), otherwise {@code null}
     */
    static String ourTarget(Path place) {
        if (!Files.isSymbolicLink(place)) {
            return null;
        }
        try {
            Path t = Files.readSymbolicLink(place);
            String s = t.toString();
            return t.getNameCount() == 1 && !t.isAbsolute() && s.startsWith(runPrefix(place))
                    && s.length() > runPrefix(place).length() ? s : null;
        } catch (IOException e) {
            return null;
        }
    }

    /** Follows links that are not ours (at most 40), so the output goes where they point. */
    private static Path resolveUserLinks(Path target) {
        Path p = target.toAbsolutePath().normalize();
        for (int i = 0; i < 40; i++) {
            if (!Files.isSymbolicLink(p) || ourTarget(p) != null) {
                return p;
            }
            try {
                Path to = Files.readSymbolicLink(p);
                Path parent = p.getParent();
                p = (parent == null ? to : parent.resolve(to)).toAbsolutePath().normalize();
            } catch (IOException e) {
                throw new BadInputException("cannot follow the link " + target + ": " + e.getMessage(), e);
            }
        }
        throw new BadInputException("the output folder " + target + " is a chain of more than 40 links (a loop?)");
    }

    // ---------------------------------------------------------------- checks

    /**
     * Refuses a place this tool may not replace: anything but nothing at all or one of its links
     * whose folder holds only what its marker lists.
     */
    private static void requireReplaceable(Path requested, Path place) {
        String shown = requested.toString() + (place.equals(requested.toAbsolutePath().normalize()) ? ""
                : " (a link to " + place + ")");
        if (!Files.exists(place, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        String target = ourTarget(place);
        if (target == null) {
            String what = Files.isDirectory(place, LinkOption.NOFOLLOW_LINKS)
                    ? "is a folder this tool did not make" + (isEmpty(place) ? " (it is empty)" : "")
                    : Files.isRegularFile(place, LinkOption.NOFOLLOW_LINKS) ? "is a file" : "is not a folder";
            throw new BadInputException("the output folder " + shown + " already exists and " + what + "; nothing"
                    + " was touched. This tool replaces only an output folder it made itself (a link to a hidden"
                    + " ." + place.getFileName() + ".run-... folder holding " + MARKER + "): choose an --out that"
                    + " does not exist yet, or move it away yourself");
        }
        Path folder = place.resolveSibling(target);
        if (!Files.exists(folder, LinkOption.NOFOLLOW_LINKS)) {
            return; // a dangling link of ours holds nothing
        }
        if (!Files.isDirectory(folder, LinkOption.NOFOLLOW_LINKS)) {
            throw refusedLink(shown, folder, "it is not a folder");
        }
        JsonNode m;
        try {
            m = JSON.readTree(folder.resolve(MARKER).toFile());
        } catch (IOException e) {
            throw refusedLink(shown, folder, "its marker " + MARKER + " is missing or unreadable");
        }
        String id = target.substring(runPrefix(place).length());
        if (m == null || !TOOL.equals(m.path("tool").asText()) || !id.equals(m.path("run_id").asText())
                || !m.path("files").isArray()) {
            throw refusedLink(shown, folder, "its marker " + MARKER + " does not describe a finished run " + id);
        }
        TreeSet<String> listed = new TreeSet<>();
        m.path("files").forEach(f -> listed.add(f.asText()));
        List<String> present;
        try {
            present = listFiles(folder);
        } catch (IOException e) {
            throw refusedLink(shown, folder, "it cannot be read (" + e.getMessage() + ")");
        }
        List<String> foreign = new ArrayList<>();
        for (String f : present) {
            if (!listed.contains(f)) {
                foreign.add(f);
            }
        }
        if (!foreign.isEmpty()) {
            throw new BadInputException("the output folder " + shown + " now also holds " + foreign.get(0)
                    + (foreign.size() > 1 ? " and " + (foreign.size() - 1) + " more" : "") + ", which this tool did"
                    + " not write; nothing was touched. Move those files away, or choose another --out");
        }
    }

    private static BadInputException refusedLink(String shown, Path folder, String why) {
        return new BadInputException("the output folder " + shown + " links to " + folder + ", but " + why
                + "; nothing was touched. Choose another --out, or remove the link yourself");
    }

    private static boolean isEmpty(Path dir) {
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir)) {
            return !s.iterator().hasNext();
        } catch (IOException e) {
            return false;
        }
    }

    /**
     * @param folder a versioned folder
     * @return every entry below it except the marker, relative, with {@code /} between names,
     *         folders ending in {@code /}; links and other non-regular files as they are
     */
    static List<String> listFiles(Path folder) throws IOException {
        List<String> names = new ArrayList<>();
        Files.walkFileTree(folder, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                if (!dir.equals(folder)) {
                    names.add(relative(folder, dir) + "/");
                }
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                String r = relative(folder, file);
                if (!r.equals(MARKER)) {
                    names.add(attrs.isRegularFile() ? r : r + " (not a regular file)");
                }
                return FileVisitResult.CONTINUE;
            }
        });
        names.sort(null);
        return names;
    }

    private static String relative(Path root, Path p) {
        StringBuilder b = new StringBuilder();
        for (Path part : root.relativize(p)) {
            b.append(b.length() == 0 ? "" : "/").append(part);
        }
        return b.toString();
    }

    // ---------------------------------------------------------------- clean-up

    /** Removes versioned folders and links of crashed runs; holds the lock while called. */
    private static void removeStale(Path place, List<String> notes) throws IOException {
        String current = ourTarget(place);
        String runs = runPrefix(place);
        String links = linkPrefix(place);
        List<Path> stale = new ArrayList<>();
        try (DirectoryStream<Path> s = Files.newDirectoryStream(place.getParent())) {
            for (Path p : s) {
                String n = p.getFileName().toString();
                if (n.startsWith(links) && Files.isSymbolicLink(p)) {
                    stale.add(p);
                } else if (n.startsWith(runs) && !n.equals(current) && Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                    stale.add(p);
                }
            }
        }
        for (Path p : stale) {
            if (Files.isSymbolicLink(p)) {
                step(Step.DELETE, p);
                Files.deleteIfExists(p);
                continue;
            }
            FileChannel held = null;
            Path m = p.resolve(MARKER);
            if (Files.exists(m, LinkOption.NOFOLLOW_LINKS)) {
                held = lockQuietly(m);
                if (held == null) {
                    continue; // a live run
                }
            }
            try {
                deleteTree(p);
            } catch (IOException e) {
                notes.add("could not remove " + p + ", left by an earlier run that did not finish ("
                        + reason(e, p) + "); remove it by hand");
            } finally {
                closeQuietly(held);
            }
        }
    }

    /** @return an open channel holding the file's lock, or {@code null} when a live run holds it */
    private static FileChannel lockQuietly(Path file) {
        FileChannel c = null;
        try {
            c = FileChannel.open(file, StandardOpenOption.WRITE);
            if (c.tryLock() != null) {
                return c;
            }
        } catch (OverlappingFileLockException | IOException e) {
            // held in this process, or gone
        }
        closeQuietly(c);
        return null;
    }

    // ---------------------------------------------------------------- the lock

    /** The lock file's lock, taken by one thread of one process at a time. */
    private static final class GlobalLock implements AutoCloseable {
        private final ReentrantLock local;
        private final FileChannel channel;
        private final FileLock lock;

        private GlobalLock(ReentrantLock local, FileChannel channel, FileLock lock) {
            this.local = local;
            this.channel = channel;
            this.lock = lock;
        }

        static GlobalLock take(Path place) throws IOException {
            Path file = place.resolveSibling("." + place.getFileName() + ".lock");
            ReentrantLock local = IN_PROCESS.computeIfAbsent(file, f -> new ReentrantLock());
            local.lock();
            FileChannel channel = null;
            try {
                channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
                return new GlobalLock(local, channel, channel.lock());
            } catch (IOException | RuntimeException e) {
                closeQuietly(channel);
                local.unlock();
                throw e;
            }
        }

        @Override
        public void close() {
            try {
                lock.release();
            } catch (IOException e) {
                // closing the channel releases it too
            }
            closeQuietly(channel);
            local.unlock();
        }
    }

    // ---------------------------------------------------------------- helpers

    private static void step(Step step, Path path) throws IOException {
        faults.at(step, path);
    }

    private static void write(FileChannel channel, ObjectNode marker) throws IOException {
        byte[] bytes = JSON.writeValueAsBytes(marker);
        channel.truncate(0);
        ByteBuffer b = ByteBuffer.wrap(bytes);
        long at = 0;
        while (b.hasRemaining()) {
            at += channel.write(b, at);
        }
    }

    private static void closeQuietly(FileChannel c) {
        if (c != null) {
            try {
                c.close();
            } catch (IOException e) {
                // nothing to do
            }
        }
    }

    private static List<Path> createParents(Path target, Path parent) {
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
        return created;
    }

    private static String reason(Exception e, Path parent) {
        for (Path p = parent; p != null; p = p.getParent()) {
            if (Files.exists(p) && !Files.isDirectory(p)) {
                return p + " is a file, not a folder";
            }
        }
        return e.getClass().getSimpleName() + (e.getMessage() == null ? "" : " " + e.getMessage());
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

    /**
     * Deletes a tree without following links; tolerates entries another run deletes meanwhile.
     *
     * @param root the folder
     */
    static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                step(Step.DELETE, file);
                delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFileFailed(Path file, IOException exc) throws IOException {
                if (exc instanceof NoSuchFileException) {
                    return FileVisitResult.CONTINUE;
                }
                throw exc;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                if (exc != null && !(exc instanceof NoSuchFileException)) {
                    throw exc;
                }
                step(Step.DELETE, dir);
                delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }

    private static void delete(Path p) throws IOException {
        try {
            Files.delete(p);
        } catch (NoSuchFileException e) {
            // removed by another run meanwhile
        }
    }
}
