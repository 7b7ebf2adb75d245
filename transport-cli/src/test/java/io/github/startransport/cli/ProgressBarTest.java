package io.github.startransport.cli;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ProgressBarTest {

    private static String draw(boolean enabled) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ProgressBar bar = new ProgressBar(new PrintStream(bytes, true, StandardCharsets.UTF_8), 4, enabled);
        bar.start();
        for (int i = 0; i < 4; i++) {
            bar.step("p" + i);
        }
        bar.finish();
        return bytes.toString(StandardCharsets.UTF_8);
    }

    @Test
    void drawsInPlaceUpToTheTotalWhenEnabled() {
        String text = draw(true);
        assertTrue(text.contains("\r"), text);
        assertTrue(text.contains("0/4") && text.contains("2/4") && text.contains("4/4"), text);
        assertTrue(text.endsWith(System.lineSeparator()), text);
    }

    @Test
    void printsNothingWithoutAConsole() {
        assertEquals("", draw(false));
    }
}
