package io.github.startransport.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class OutputFolderTest {

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void filesAppearOnlyOnCommit(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        try (OutputFolder f = OutputFolder.open(target)) {
            Files.writeString(f.staging().resolve("zones.csv"), "a");
            assertFalse(Files.exists(target));
            f.commit();
        }
        assertEquals(List.of("out"), names(dir));
        assertEquals("a", Files.readString(target.resolve("zones.csv")));
    }

    @Test
    void closingWithoutCommitLeavesNothingBehindIncludingCreatedParents(@TempDir Path dir) throws IOException {
        try (OutputFolder f = OutputFolder.open(dir.resolve("x/y/out"))) {
            Files.writeString(f.staging().resolve("zones.csv"), "a");
        }
        assertEquals(List.of(), names(dir));
    }

    @Test
    void aPreviousRunsOutputIsReplacedWhole(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("out");
        try (OutputFolder f = OutputFolder.open(target)) {
            Files.writeString(f.staging().resolve("zones.csv"), "old");
            Files.writeString(f.staging().resolve("opacity.png"), "old");
            f.commit();
        }
        try (OutputFolder f = OutputFolder.open(target)) {
            Files.writeString(f.staging().resolve("zones.csv"), "new");
            f.commit();
        }
        assertEquals(List.of("out"), names(dir));
        assertEquals(List.of("zones.csv"), names(target));
        assertEquals("new", Files.readString(target.resolve("zones.csv")));
    }

    @Test
    void aFolderWithOtherFilesOrARegularFileIsRefused(@TempDir Path dir) throws IOException {
        Path other = Files.createDirectories(dir.resolve("other/sub"));
        Files.writeString(other.resolve("mine.txt"), "x");
        assertThrows(BadInputException.class, () -> OutputFolder.open(dir.resolve("other")));
        Path file = Files.writeString(dir.resolve("file"), "x");
        assertThrows(BadInputException.class, () -> OutputFolder.open(file));
        BadInputException e = assertThrows(BadInputException.class, () -> OutputFolder.open(file.resolve("out")));
        assertTrue(e.getMessage().contains("not a folder"), e.getMessage());
        assertEquals(List.of("file", "other"), names(dir));
    }
}
