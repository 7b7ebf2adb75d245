package io.github.startransport.examples;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Keeps the code blocks of a Markdown file equal to marked regions of source files that the build
 * compiles and runs.
 *
 * <p>In the Markdown file, a fenced block is tied to a region by an HTML comment on the last
 * non-blank line before its opening fence: {@code <!-- snippet: NAME -->}. Every {@code java}
 * block must be tied; blocks in other languages may be.
 *
 * <p>In a source file, the region is the lines between a start line and an end line, each a
 * comment on a line of its own: {@code snippet-start:} or {@code snippet-end:} followed by NAME,
 * after any of the comment openers {@code //}, {@code #}, {@code !}, {@code ;}, {@code --},
 * {@code /*} or {@code <!--} (with the closing {@code * /} or {@code -->} allowed after NAME). So
 * Java, C, Fortran, shell and XML files can all hold regions. The files searched are those under
 * a {@code src/test} folder of any module, and the modules' {@code pom.xml} files.
 *
 * <p>Comparison ignores the common leading indentation of each side (a README block inside a list
 * item is indented, a region inside a method is indented) and trailing blanks; everything else,
 * relative indentation included, must be equal. In a region, {@code ${project.version}} reads as
 * the build's version, so that a dependency block shows the number a reader types.
 */
final class Snippets {

    /** A block of text with a name, and where it came from. */
    record Block(String name, String language, List<String> lines, Path file, int firstLine) {
    }

    private static final Pattern README_TAG = Pattern.compile("^\\s*<!--\\s*snippet:\\s*([\\w.-]+)\\s*-->\\s*$");
    private static final Pattern FENCE = Pattern.compile("^(\\s*)(```+|~~~+)\\s*([\\w+-]*).*$");
    private static final String OPENERS = "(?://+|#+|!+|;+|--|/\\*+|<!--)";
    private static final String CLOSERS = "(?:\\*+/|-->)?";
    private static final Pattern START = Pattern.compile(
            "^\\s*" + OPENERS + "\\s*snippet-start:\\s*([\\w.-]+)\\s*" + CLOSERS + "\\s*$");
    private static final Pattern END = Pattern.compile(
            "^\\s*" + OPENERS + "\\s*snippet-end:\\s*([\\w.-]+)\\s*" + CLOSERS + "\\s*$");
    private static final Set<String> SKIPPED_FOLDERS = Set.of("target", "node_modules", "build");
    private static final String VERSION_PLACEHOLDER = "${project.version}";

    private Snippets() {
    }

    /**
     * Reads the fenced blocks of a Markdown text that carry a snippet tag, and reports untagged
     * {@code java} blocks and tags that are not followed by a block.
     *
     * @param file     the Markdown file's path, for messages
     * @param text     its lines
     * @param problems receives one line per problem
     * @return the tagged blocks, in order
     */
    static List<Block> markdownBlocks(Path file, List<String> text, List<String> problems) {
        List<Block> blocks = new ArrayList<>();
        String pendingTag = null;
        int pendingTagLine = 0;
        for (int i = 0; i < text.size(); i++) {
            String line = text.get(i);
            Matcher tag = README_TAG.matcher(line);
            Matcher fence = FENCE.matcher(line);
            if (tag.matches()) {
                if (pendingTag != null) {
                    problems.add(file + ":" + pendingTagLine + ": the tag <!-- snippet: " + pendingTag
                            + " --> is not followed by a fenced code block; put it on the line above the block's ```");
                }
                pendingTag = tag.group(1);
                pendingTagLine = i + 1;
            } else if (fence.matches()) {
                String marker = fence.group(2);
                String language = fence.group(3);
                int open = i;
                List<String> body = new ArrayList<>();
                i++;
                while (i < text.size() && !text.get(i).trim().startsWith(marker)) {
                    body.add(text.get(i));
                    i++;
                }
                if (i >= text.size()) {
                    problems.add(file + ":" + (open + 1) + ": the code block opened here is never closed");
                }
                if (pendingTag != null) {
                    blocks.add(new Block(pendingTag, language, body, file, open + 2));
                } else if (language.equals("java")) {
                    problems.add(file + ":" + (open + 1) + ": this java block is not tied to a compiled source."
                            + " Put its code in a test source between the lines '// snippet-start: NAME' and"
                            + " '// snippet-end: NAME' (in a test that runs it), and put '<!-- snippet: NAME -->'"
                            + " on the line above the block's opening ``` (see DEVELOPERS.md, README code blocks)");
                }
                pendingTag = null;
            } else if (!line.isBlank() && pendingTag != null) {
                problems.add(file + ":" + pendingTagLine + ": the tag <!-- snippet: " + pendingTag
                        + " --> is not followed by a fenced code block; put it on the line above the block's ```");
                pendingTag = null;
            }
        }
        if (pendingTag != null) {
            problems.add(file + ":" + pendingTagLine + ": the tag <!-- snippet: " + pendingTag
                    + " --> is not followed by a fenced code block");
        }
        return blocks;
    }

    /**
     * Reads the marked regions of one source text.
     *
     * @param file     the file's path, for messages
     * @param text     its lines
     * @param problems receives one line per malformed region
     * @return the regions, in order
     */
    static List<Block> regions(Path file, List<String> text, List<String> problems) {
        List<Block> regions = new ArrayList<>();
        String open = null;
        int openLine = 0;
        List<String> body = new ArrayList<>();
        for (int i = 0; i < text.size(); i++) {
            Matcher start = START.matcher(text.get(i));
            Matcher end = END.matcher(text.get(i));
            if (start.matches()) {
                if (open != null) {
                    problems.add(file + ":" + (i + 1) + ": region '" + start.group(1) + "' starts inside region '"
                            + open + "' (opened on line " + openLine + "); regions do not nest");
                }
                open = start.group(1);
                openLine = i + 1;
                body = new ArrayList<>();
            } else if (end.matches()) {
                if (open == null) {
                    problems.add(file + ":" + (i + 1) + ": 'snippet-end: " + end.group(1)
                            + "' without a matching 'snippet-start: " + end.group(1) + "' above it");
                } else if (!open.equals(end.group(1))) {
                    problems.add(file + ":" + (i + 1) + ": 'snippet-end: " + end.group(1) + "' closes region '"
                            + open + "' (opened on line " + openLine + "); write 'snippet-end: " + open + "'");
                    open = null;
                } else {
                    regions.add(new Block(open, "", body, file, openLine + 1));
                    open = null;
                }
            } else if (open != null) {
                body.add(text.get(i));
            }
        }
        if (open != null) {
            problems.add(file + ":" + openLine + ": region '" + open + "' is never closed; add a line"
                    + " 'snippet-end: " + open + "' (as a comment) after its last line");
        }
        return regions;
    }

    /**
     * Finds every marked region under the project root: in files below a {@code src/test} folder
     * and in {@code pom.xml} files, skipping build output.
     *
     * @param root     the project's root folder
     * @param problems receives malformed regions and names used twice
     * @return the regions by name
     */
    static Map<String, Block> projectRegions(Path root, List<String> problems) {
        Map<String, Block> byName = new LinkedHashMap<>();
        List<Path> files = new ArrayList<>();
        try {
            Files.walkFileTree(root, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                    String name = dir.getFileName() == null ? "" : dir.getFileName().toString();
                    boolean skip = !dir.equals(root) && (SKIPPED_FOLDERS.contains(name) || name.startsWith("."));
                    return skip ? FileVisitResult.SKIP_SUBTREE : FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                    String relative = root.relativize(file).toString().replace('\\', '/');
                    if (attrs.isRegularFile()
                            && (file.getFileName().toString().equals("pom.xml") || relative.contains("src/test/"))) {
                        files.add(file);
                    }
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        files.sort(null);
        for (Path f : files) {
            List<String> lines;
            try {
                lines = Files.readAllLines(f, StandardCharsets.UTF_8);
            } catch (MalformedInputException binary) {
                continue;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            for (Block b : regions(root.relativize(f), lines, problems)) {
                Block earlier = byName.putIfAbsent(b.name(), b);
                if (earlier != null) {
                    problems.add(b.file() + ":" + (b.firstLine() - 1) + ": region name '" + b.name()
                            + "' is already used at " + earlier.file() + ":" + (earlier.firstLine() - 1)
                            + "; give one of them another name");
                }
            }
        }
        return byName;
    }

    /**
     * Compares every tagged Markdown block with the region of the same name, and reports regions
     * that no block shows.
     *
     * @param blocks   the tagged blocks of the Markdown file
     * @param regions  the regions by name
     * @param version  the build's version, replacing {@code ${project.version}} in regions
     * @param problems receives one entry per difference, with the text to paste
     */
    static void compare(List<Block> blocks, Map<String, Block> regions, String version, List<String> problems) {
        Set<String> shown = new HashSet<>();
        for (Block b : blocks) {
            Block region = regions.get(b.name());
            if (region == null) {
                problems.add(b.file() + ":" + (b.firstLine() - 2) + ": no source region is named '" + b.name()
                        + "'. Mark the code that this block shows, in a test source that compiles and runs it,"
                        + " with the comment lines 'snippet-start: " + b.name() + "' and 'snippet-end: "
                        + b.name() + "'");
                continue;
            }
            shown.add(b.name());
            List<String> expected = dedent(region.lines().stream()
                    .map(l -> l.replace(VERSION_PLACEHOLDER, version)).toList());
            List<String> actual = dedent(b.lines());
            int n = Math.max(expected.size(), actual.size());
            for (int i = 0; i < n; i++) {
                String want = i < expected.size() ? expected.get(i) : null;
                String got = i < actual.size() ? actual.get(i) : null;
                if (want == null || !want.equals(got)) {
                    problems.add(b.file() + ":" + (b.firstLine() + i) + ": the block '" + b.name()
                            + "' differs from " + region.file() + ":" + (region.firstLine() + i) + ", which the build"
                            + " compiles and runs.\n    " + b.file() + " has:   " + show(got)
                            + "\n    the source has: " + show(want)
                            + "\n  Make the block read (inside its fence, indented as it is):\n"
                            + String.join("\n", expected));
                    break;
                }
            }
        }
        for (Block r : regions.values()) {
            if (!shown.contains(r.name())) {
                problems.add(r.file() + ":" + (r.firstLine() - 1) + ": region '" + r.name() + "' is shown by no"
                        + " block of the README; tag the block that shows it with <!-- snippet: " + r.name()
                        + " -->, or remove the region's marker lines");
            }
        }
    }

    private static String show(String line) {
        return line == null ? "(nothing: the block ends here)" : "'" + line + "'";
    }

    /**
     * Removes trailing blanks and the indentation common to all non-blank lines.
     *
     * @param lines text lines
     * @return the lines without that indentation
     */
    static List<String> dedent(List<String> lines) {
        int common = Integer.MAX_VALUE;
        for (String l : lines) {
            if (!l.isBlank()) {
                int k = 0;
                while (k < l.length() && l.charAt(k) == ' ') {
                    k++;
                }
                common = Math.min(common, k);
            }
        }
        int cut = common == Integer.MAX_VALUE ? 0 : common;
        List<String> out = new ArrayList<>(lines.size());
        for (String l : lines) {
            String t = l.stripTrailing();
            out.add(t.isEmpty() ? "" : t.substring(cut));
        }
        return out;
    }
}
