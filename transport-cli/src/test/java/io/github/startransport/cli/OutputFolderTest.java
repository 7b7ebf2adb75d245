package io.github.startransport.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class OutputFolderTest {

    @AfterEach
    void noHook() {
        OutputFolder.faults = (s, p) -> {
        };
    }

    static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    /** One complete run writing zones.csv with the given text. */
    static List<String> run(Path target, String text) throws IOException {
        try (OutputFolder f = OutputFolder.open(target, List.of("test"), new ArrayList<>())) {
            Files.writeString(f.staging().resolve("zones.csv"), text);
            return f.commit();
        }
    }

    /** The names beside a committed DIR: DIR, its lock file and the one folder it points to. */
    static List<String> expectedBeside(Path dir, String name) throws IOException {
        Path link = dir.resolve(name);
        String target = Files.readSymbolicLink(link).toString();
        return Stream.of(name, "." + name + ".lock", target).sorted().toList();
    }

    @Test
    void filesAppearOnlyOnCommitThroughALinkToAVersionedFolderWithAMarker(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        try (OutputFolder f = OutputFolder.open(target, List.of("diagnose", "p.csv"), new ArrayList<>())) {
            Files.writeString(f.staging().resolve("zones.csv"), "a");
            assertFalse(Files.exists(target, java.nio.file.LinkOption.NOFOLLOW_LINKS));
            assertTrue(f.commit().isEmpty());
        }
        assertTrue(Files.isSymbolicLink(target));
        assertEquals("a", Files.readString(target.resolve("zones.csv")));
        assertEquals(expectedBeside(dir, "out"), names(dir));
        JsonNode m = new ObjectMapper().readTree(target.resolve(OutputFolder.MARKER).toFile());
        assertEquals(OutputFolder.TOOL, m.get("tool").asText());
        assertEquals("complete", m.get("state").asText());
        assertEquals("[\"zones.csv\"]", m.get("files").toString());
        assertEquals("[\"diagnose\",\"p.csv\"]", m.get("command").toString());
        assertTrue(Files.readSymbolicLink(target).toString().endsWith(m.get("run_id").asText()));
    }

    @Test
    void closingWithoutCommitLeavesNothingBehindIncludingCreatedParents(@TempDir Path dir) throws IOException {
        try (OutputFolder f = OutputFolder.open(dir.resolve("x/y/out"), List.of(), new ArrayList<>())) {
            Files.writeString(f.staging().resolve("zones.csv"), "a");
        }
        assertEquals(List.of(), names(dir));
    }

    @Test
    void aPreviousRunsOutputIsReplacedWholeAndItsFolderRemoved(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        try (OutputFolder f = OutputFolder.open(target, List.of(), new ArrayList<>())) {
            Files.writeString(f.staging().resolve("zones.csv"), "old");
            Files.writeString(f.staging().resolve("opacity.png"), "old");
            f.commit();
        }
        run(target, "new");
        assertEquals(expectedBeside(dir, "out"), names(dir));
        assertEquals(List.of("zones.csv"), OutputFolder.listFiles(target.toRealPath()));
        assertEquals("new", Files.readString(target.resolve("zones.csv")));
    }

    @Test
    void aRealFolderWithSomeonesFilesIsRefusedAndUntouched(@TempDir Path dir) throws IOException {
        // the case: a folder named like ours, holding a file named like ours
        Path mine = Files.createDirectories(dir.resolve("out/mine"));
        Files.writeString(mine.resolve("summary.json"), "precious");
        BadInputException e = assertThrows(BadInputException.class,
                () -> OutputFolder.open(dir.resolve("out"), List.of(), new ArrayList<>()));
        assertTrue(e.getMessage().contains("did not make"), e.getMessage());
        assertEquals("precious", Files.readString(mine.resolve("summary.json")));
        assertEquals(List.of("out"), names(dir));
    }

    @Test
    void anEmptyRealFolderAFileAndAFileAsParentAreRefused(@TempDir Path dir) throws IOException {
        Files.createDirectories(dir.resolve("empty"));
        BadInputException empty = assertThrows(BadInputException.class,
                () -> OutputFolder.open(dir.resolve("empty"), List.of(), new ArrayList<>()));
        assertTrue(empty.getMessage().contains("(it is empty)"), empty.getMessage());
        Path file = Files.writeString(dir.resolve("file"), "x");
        assertThrows(BadInputException.class, () -> OutputFolder.open(file, List.of(), new ArrayList<>()));
        BadInputException e = assertThrows(BadInputException.class,
                () -> OutputFolder.open(file.resolve("out"), List.of(), new ArrayList<>()));
        assertTrue(e.getMessage().contains("not a folder"), e.getMessage());
        assertEquals(List.of("empty", "file"), names(dir));
        assertEquals("x", Files.readString(file));
    }

    @Test
    void aFilePutIntoOurOutputAfterwardsMakesItSomeonesAndBlocksReplacement(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        run(target, "old");
        Files.writeString(target.resolve("notes.txt"), "mine");
        List<String> before = names(dir);
        BadInputException e = assertThrows(BadInputException.class, () -> run(target, "new"));
        assertTrue(e.getMessage().contains("notes.txt"), e.getMessage());
        assertEquals(before, names(dir));
        assertEquals("mine", Files.readString(target.resolve("notes.txt")));
        assertEquals("old", Files.readString(target.resolve("zones.csv")));
    }

    @Test
    void aFileAppearingWhileTheRunWritesIsCaughtAtCommit(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        run(target, "old");
        try (OutputFolder f = OutputFolder.open(target, List.of(), new ArrayList<>())) {
            Files.writeString(f.staging().resolve("zones.csv"), "new");
            Files.writeString(target.resolve("late.txt"), "mine");
            assertThrows(BadInputException.class, f::commit);
        }
        assertEquals("mine", Files.readString(target.resolve("late.txt")));
        assertEquals("old", Files.readString(target.resolve("zones.csv")));
        assertEquals(expectedBeside(dir, "out"), names(dir));
    }

    @Test
    void aLinkThatIsNotOursIsFollowedAndLeftAlone(@TempDir Path dir) throws IOException {
        Path elsewhere = Files.createDirectories(dir.resolve("big/disk"));
        Path link = Files.createSymbolicLink(dir.resolve("out"), elsewhere.resolve("results"));
        run(link, "first");
        run(link, "second");
        assertEquals(elsewhere.resolve("results"), Files.readSymbolicLink(link));
        assertEquals("second", Files.readString(link.resolve("zones.csv")));
        assertEquals(expectedBeside(elsewhere, "results"), names(elsewhere));
        // a link to a real folder of someone's is refused like the folder itself
        Path theirs = Files.createDirectories(dir.resolve("theirs"));
        Files.writeString(theirs.resolve("data.csv"), "keep");
        Path link2 = Files.createSymbolicLink(dir.resolve("out2"), theirs);
        BadInputException e = assertThrows(BadInputException.class, () -> run(link2, "x"));
        assertTrue(e.getMessage().contains("a link to"), e.getMessage());
        assertEquals(List.of("data.csv"), names(theirs));
    }

    @Test
    void aStaleFolderOfACrashedRunIsRemovedByTheNextRunButALiveOneIsNot(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        run(target, "old");
        Path stale = Files.createDirectories(dir.resolve(".out.run-19700101T000000-dead"));
        Files.writeString(stale.resolve("zones.csv"), "half");
        Files.writeString(stale.resolve(OutputFolder.MARKER), "{}");
        Files.createSymbolicLink(dir.resolve(".out.link-19700101T000000-dead"), stale.getFileName());
        try (OutputFolder live = OutputFolder.open(target, List.of(), new ArrayList<>())) {
            assertFalse(Files.exists(stale));
            run(target, "other"); // a second run meanwhile must not remove the live run's folder
            assertTrue(Files.isDirectory(live.staging()));
            Files.writeString(live.staging().resolve("zones.csv"), "live");
            live.commit();
        }
        assertEquals("live", Files.readString(target.resolve("zones.csv")));
        assertEquals(expectedBeside(dir, "out"), names(dir));
    }

    @Test
    void anOldFolderThatCannotBeRemovedIsAWarningNotAFailure(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        run(target, "old");
        Path old = target.toRealPath();
        // tests run as root, where permissions do not stop a deletion: inject the refusal instead
        OutputFolder.faults = (step, path) -> {
            if (step == OutputFolder.Step.DELETE && path.startsWith(old)) {
                throw new AccessDeniedException(path.toString());
            }
        };
        List<String> warnings = run(target, "new");
        assertEquals(1, warnings.size(), warnings.toString());
        assertTrue(warnings.get(0).contains(old.toString()), warnings.get(0));
        assertEquals("new", Files.readString(target.resolve("zones.csv")));
        noHook();
        run(target, "newer"); // the next run removes the leftover
        assertEquals(expectedBeside(dir, "out"), names(dir));
    }

    @Test
    void anImmutableOldFolderIsAWarningToo(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("out");
        run(target, "old");
        Path old = target.toRealPath();
        // the file system's own refusal, where chattr is there and allowed (root on ext4); skipped otherwise
        org.junit.jupiter.api.Assumptions.assumeTrue(chattr("+i", old), "chattr +i is not available here");
        try {
            List<String> warnings = run(target, "new");
            assertEquals(1, warnings.size(), warnings.toString());
            assertEquals("new", Files.readString(target.resolve("zones.csv")));
            assertTrue(Files.isDirectory(old));
        } finally {
            chattr("-i", old);
        }
    }

    @Test
    void theToolRefusesSomeonesFolderWithExitOneAndTouchesNothing(@TempDir Path dir) throws IOException {
        // the command: mkdir -p out/mine; echo precious > out/mine/summary.json; diagnose p.csv --out out
        Path p = ProfileFiles.valid(dir, "p.csv");
        Path mine = Files.createDirectories(dir.resolve("out/mine"));
        Files.writeString(mine.resolve("summary.json"), "precious\n");
        Runs r = Runs.run("diagnose", p.toString(), "--out", dir.resolve("out").toString());
        assertEquals(1, r.code(), r.toString());
        assertTrue(r.err().contains("did not make") && !r.err().contains("Exception"), r.err());
        assertEquals("precious\n", Files.readString(mine.resolve("summary.json")));
        assertEquals(List.of("mine"), names(dir.resolve("out")));
    }

    @Test
    void theToolReportsACommittedRunWhoseOldFolderStaysAsSuccess(@TempDir Path dir) throws IOException {
        Path p = ProfileFiles.valid(dir, "p.csv");
        Path out = dir.resolve("out");
        assertEquals(0, Runs.run("diagnose", p.toString(), "--out", out.toString()).code());
        Path old = out.toRealPath();
        OutputFolder.faults = (step, path) -> {
            if (step == OutputFolder.Step.DELETE && path.startsWith(old)) {
                throw new AccessDeniedException(path.toString()); // what a read-only folder gives a non-root user
            }
        };
        Runs r = Runs.run("diagnose", "--demo", "--out", out.toString());
        assertEquals(0, r.code(), r.toString());
        assertTrue(r.err().contains("warning: the new output is in place") && r.err().contains(old.toString()),
                r.err());
        assertFalse(r.err().contains("internal error") || r.err().contains("Exception\n\tat"), r.err());
        assertTrue(Files.readString(out.resolve("summary.json")).contains("Corvina"));
    }

    static boolean chattr(String flag, Path p) {
        try {
            Process pr = new ProcessBuilder("chattr", flag, p.toString()).redirectErrorStream(true).start();
            pr.getInputStream().readAllBytes();
            return pr.waitFor() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
