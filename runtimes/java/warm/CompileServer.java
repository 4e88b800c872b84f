// Assay's warm Java compiler: one JVM that stays up for many candidates and compiles each with
// the JDK's compiler API (javax.tools), so a candidate pays for javac's work, not for starting a
// JVM and loading javac again. Started by harness/sandbox/warm_compilers.py inside a sandbox of
// its own (no network, no host files); it never runs what it compiles.
//
// Protocol, on stdin and stdout: every field is its length in bytes as decimal digits, a
// newline, then the bytes. The request "hello" is answered "ready" once the server is up. A
// request is the field "compile", the number of arguments, the arguments (the runtime's cold
// compile command: javac and its options), the number of files
// and each file's name and bytes. The server empties its work dir (its current directory),
// writes the files, and runs javac's command-line entry point on the arguments, so options,
// messages and exit status are those of the javac command. The reply is the field "done", the
// exit status, javac's stdout and stderr, and every file javac left in the work dir (name and
// bytes). An exit status of 3 or 4 (javac out of resources, or crashed) ends the server after
// its reply: a crashed compiler is not trusted with the next candidate.
//
// javac's -J options configure the JVM that runs javac; here the JVM is already running, so
// they are dropped (the harness starts this JVM with the same settings). Annotation processing
// stays off: the runtime's command says -proc:none, and the server refuses a command without it.

import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.ByteArrayOutputStream;
import java.io.EOFException;
import java.io.FileDescriptor;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;

final class CompileServer {
    private static final long STACK_BYTES = 8L << 20; // as the cold command's -J-Xss8m
    private static final int MAX_FIELD = 64 << 20;

    public static void main(String[] args) throws Exception {
        InputStream in = new BufferedInputStream(System.in, 1 << 16);
        OutputStream out = new BufferedOutputStream(new FileOutputStream(FileDescriptor.out), 1 << 16);
        // Nothing the compiler prints may reach the protocol stream.
        PrintStream sink = new PrintStream(OutputStream.nullOutputStream());
        System.setOut(sink);
        System.setErr(sink);
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        if (javac == null) {
            throw new IllegalStateException("no system Java compiler (a JRE without javac?)");
        }
        Path work = Paths.get("").toAbsolutePath();
        while (true) {
            String op;
            try {
                op = text(field(in));
            } catch (EOFException end) {
                return; // the harness closed the channel
            }
            if (op.equals("hello")) {
                write(out, "ready");
                out.flush();
                continue;
            }
            if (!op.equals("compile")) {
                throw new IOException("unknown request " + op);
            }
            List<String> command = new ArrayList<>();
            int argc = number(in);
            for (int i = 0; i < argc; i++) {
                command.add(text(field(in)));
            }
            int files = number(in);
            empty(work);
            List<String> inputs = new ArrayList<>();
            for (int i = 0; i < files; i++) {
                String name = text(field(in));
                byte[] data = field(in);
                Files.write(work.resolve(plain(name)), data);
                inputs.add(name);
            }
            List<String> options = new ArrayList<>();
            for (String arg : command.subList(1, command.size())) {
                if (!arg.startsWith("-J")) {
                    options.add(arg);
                }
            }
            if (!options.contains("-proc:none")) {
                throw new IOException("refusing a javac command without -proc:none");
            }
            int status = compile(javac, options.toArray(new String[0]));
            write(out, "done");
            write(out, Integer.toString(status));
            write(out, Outputs.stdout.toByteArray());
            write(out, Outputs.stderr.toByteArray());
            List<Path> made = new ArrayList<>();
            try (Stream<Path> listing = Files.list(work)) {
                listing.filter(p -> !inputs.contains(p.getFileName().toString()))
                       .filter(p -> Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS))
                       .sorted().forEach(made::add);
            }
            write(out, Integer.toString(made.size()));
            for (Path path : made) {
                write(out, path.getFileName().toString());
                write(out, Files.readAllBytes(path));
            }
            out.flush();
            if (status == 3 || status == 4) {
                return; // out of resources or a compiler crash: retire
            }
        }
    }

    static final class Outputs {
        static ByteArrayOutputStream stdout = new ByteArrayOutputStream();
        static ByteArrayOutputStream stderr = new ByteArrayOutputStream();
    }

    /** javac's command-line behaviour (Tool.run), on a thread with the cold command's stack. */
    private static int compile(JavaCompiler javac, String[] options) throws InterruptedException {
        Outputs.stdout = new ByteArrayOutputStream();
        Outputs.stderr = new ByteArrayOutputStream();
        int[] status = {4};
        Thread thread = new Thread(null, () -> {
            status[0] = javac.run(null, Outputs.stdout, Outputs.stderr, options);
        }, "javac", STACK_BYTES);
        thread.setUncaughtExceptionHandler((t, e) -> {
            PrintStream err = new PrintStream(Outputs.stderr, true, StandardCharsets.UTF_8);
            e.printStackTrace(err);
            status[0] = 4;
        });
        thread.start();
        thread.join();
        return status[0];
    }

    private static String plain(String name) throws IOException {
        if (name.isEmpty() || name.contains("/") || name.equals(".") || name.equals("..")) {
            throw new IOException("not a plain file name: " + name);
        }
        return name;
    }

    private static void empty(Path folder) throws IOException {
        try (Stream<Path> listing = Files.list(folder)) {
            for (Path path : (Iterable<Path>) listing::iterator) {
                remove(path);
            }
        }
    }

    private static void remove(Path path) throws IOException {
        if (Files.isDirectory(path, LinkOption.NOFOLLOW_LINKS)) {
            try (Stream<Path> listing = Files.list(path)) {
                for (Path inner : (Iterable<Path>) listing::iterator) {
                    remove(inner);
                }
            }
        }
        Files.delete(path);
    }

    private static byte[] field(InputStream in) throws IOException {
        int length = 0;
        int digits = 0;
        while (true) {
            int c = in.read();
            if (c < 0) {
                throw new EOFException();
            }
            if (c == '\n') {
                break;
            }
            if (c < '0' || c > '9' || ++digits > 9) {
                throw new IOException("bad field length");
            }
            length = length * 10 + (c - '0');
        }
        if (digits == 0 || length > MAX_FIELD) {
            throw new IOException("bad field length");
        }
        byte[] data = in.readNBytes(length);
        if (data.length != length) {
            throw new EOFException();
        }
        return data;
    }

    private static int number(InputStream in) throws IOException {
        return Integer.parseInt(text(field(in)));
    }

    private static String text(byte[] data) {
        return new String(data, StandardCharsets.UTF_8);
    }

    private static void write(OutputStream out, String text) throws IOException {
        write(out, text.getBytes(StandardCharsets.UTF_8));
    }

    private static void write(OutputStream out, byte[] data) throws IOException {
        out.write(Integer.toString(data.length).getBytes(StandardCharsets.US_ASCII));
        out.write('\n');
        out.write(data);
    }
}
