package io.github.startransport.cli;

import io.github.startransport.spi.Transport;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the tool in this JVM and keeps what it printed. */
record Runs(int code, String out, String err) {

    static Runs run(String... args) {
        return run(false, args);
    }

    static Runs run(boolean console, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), console, Transport::discover);
        return new Runs(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Override
    public String toString() {
        return "exit " + code + "\n--- out\n" + out + "--- err\n" + err;
    }
}
