package io.github.startransport.cli;

import java.util.Locale;

/** What separates the cells of a profile file's lines ({@code --delimiter}). */
enum Delimiter {
    /** A comma: CSV, the default. Cells may be quoted. */
    COMMA("comma", ','),
    /** A semicolon, as spreadsheets write CSV where the comma is the decimal sign. Cells may be quoted. */
    SEMICOLON("semicolon", ';'),
    /** One tab character between cells. Cells may be quoted. */
    TAB("tab", '\t'),
    /** Any run of spaces and tabs, as fixed-width tables are written; no quoting, no empty cells. */
    WHITESPACE("whitespace", ' ');

    private final String label;
    private final char character;

    Delimiter(String label, char character) {
        this.label = label;
        this.character = character;
    }

    /** @return the name on the command line, e.g. {@code semicolon} */
    String label() {
        return label;
    }

    /** @return the separating character ({@code ' '} for whitespace runs) */
    char character() {
        return character;
    }

    /**
     * @param text {@code comma}, {@code semicolon}, {@code tab} or {@code whitespace} (any case), or the
     *             character itself ({@code ,} {@code ;} or a tab)
     * @return the delimiter
     * @throws UsageException when the text names none
     */
    static Delimiter parse(String text) {
        String t = text.toLowerCase(Locale.ROOT);
        for (Delimiter d : values()) {
            if (d.label.equals(t.trim()) || (d != WHITESPACE && t.length() == 1 && t.charAt(0) == d.character)
                    || (d == TAB && t.equals("\\t"))) {
                return d;
            }
        }
        throw new UsageException("--delimiter '" + text + "': expected comma, semicolon, tab or whitespace");
    }

    /** picocli converter for {@code --delimiter}. */
    static final class Converter implements picocli.CommandLine.ITypeConverter<Delimiter> {
        @Override
        public Delimiter convert(String value) {
            try {
                return parse(value);
            } catch (UsageException e) {
                throw new picocli.CommandLine.TypeConversionException(e.getMessage());
            }
        }
    }
}
