package org.miscela.it;

import com.sun.star.beans.PropertyValue;
import com.sun.star.bridge.XUnoUrlResolver;
import com.sun.star.comp.helper.Bootstrap;
import com.sun.star.frame.XComponentLoader;
import com.sun.star.frame.XDesktop;
import com.sun.star.lang.XComponent;
import com.sun.star.lang.XMultiComponentFactory;
import com.sun.star.uno.UnoRuntime;
import com.sun.star.uno.XComponentContext;
import java.io.File;
import java.io.IOException;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

/**
 * A real headless LibreOffice on a throwaway private profile with the built extension installed, reached over a
 * loopback socket. As root (CI), unopkg refuses per-user installs, so the office runs as the unprivileged user
 * 65534. Closing ends only the processes this class started, by PID.
 */
public final class Office implements AutoCloseable {
    private static final int NOBODY = 65534;

    private final Path base;
    private final Path profile;
    private final Process process;
    private final XComponentContext context;
    private final XDesktop desktop;
    private final java.util.concurrent.atomic.AtomicBoolean closed = new java.util.concurrent.atomic.AtomicBoolean();

    private Office(Path base, Path profile, Process process, XComponentContext context, XDesktop desktop) {
        this.base = base;
        this.profile = profile;
        this.process = process;
        this.context = context;
        this.desktop = desktop;
    }

    static Path program() {
        return Paths.get(System.getProperty("office.program", "/usr/lib/libreoffice/program"));
    }

    /**
     * Library directories for the office's own processes, from the system property {@code office.library.path}:
     * empty (the default) for an installed office, set by scripts/test-office-25 for an unpacked one. The test JVM
     * and the build never see it.
     */
    static String libraryPath() {
        String p = System.getProperty("office.library.path");
        return p == null ? "" : p.trim();
    }

    /** Puts {@link #libraryPath()} into an office process's environment, when there is one. */
    private static void officeEnvironment(ProcessBuilder pb) {
        String lib = libraryPath();
        if (!lib.isEmpty()) {
            pb.environment().put("LD_LIBRARY_PATH", lib);
        }
    }

    static Path builtExtension() {
        String p = System.getProperty("miscela.oxt");
        if (p == null) {
            throw new IllegalStateException("system property miscela.oxt is not set; run through Maven (mvn verify)");
        }
        return Paths.get(p);
    }

    static boolean asRoot() {
        return "root".equals(System.getProperty("user.name"));
    }

    /** A fresh profile with the extension installed, and an office running on it. */
    public static Office start() throws Exception {
        return start(new Path[0]);
    }

    /** A fresh profile with the extension and these other extensions (e.g. the benchmark's probe) installed. */
    public static Office start(Path... otherExtensions) throws Exception {
        return start(java.util.Collections.emptyList(), otherExtensions);
    }

    /**
     * As {@link #start(Path...)}, with options for the office's JVM written into the profile's Java settings (what
     * Tools ▸ Options ▸ Advanced ▸ Parameters does), for the benchmark's look at the bridge floor.
     */
    public static Office start(List<String> jvmOptions, Path... otherExtensions) throws Exception {
        Path base = freshDirectory();
        // no --suppress-license and stdin from /dev/null: an install that asked anything would fail here
        unopkg(base, "add", base.resolve("miscela.oxt").toString());
        for (Path other : otherExtensions) {
            Path copy = base.resolve(other.getFileName().toString());
            Files.copy(other, copy, StandardCopyOption.REPLACE_EXISTING);
            handOver(copy);
            unopkg(base, "add", copy.toString());
        }
        if (!jvmOptions.isEmpty()) {
            javaParameters(base.resolve("profile"), jvmOptions);
        }
        return launch(base, base.resolve("profile"));
    }

    /**
     * A throwaway directory for the office's user: an empty profile ({@code profile}), a HOME ({@code home}) and a
     * copy of the built extension ({@code miscela.oxt}).
     */
    static Path freshDirectory() throws IOException, InterruptedException {
        Path base = Files.createTempDirectory("miscela-office-");
        Files.createDirectories(base.resolve("profile"));
        Files.createDirectories(base.resolve("home"));
        Files.copy(builtExtension(), base.resolve("miscela.oxt"), StandardCopyOption.REPLACE_EXISTING);
        handOver(base);
        return base;
    }

    /**
     * Runs {@code unopkg command args…} on the profile of a {@link #freshDirectory()}, as the office's user, with
     * standard input from /dev/null; fails on a non-zero exit or after three minutes. Returns what it printed.
     */
    static String unopkg(Path base, String command, String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(Arrays.asList(program().resolve("unopkg").toString(), command,
                "-env:UserInstallation=" + base.resolve("profile").toUri()));
        cmd.addAll(Arrays.asList(args));
        return run(base, 180, cmd.toArray(new String[0]));
    }

    /** Puts JVM options into the Java settings unopkg wrote when it registered the Java components. */
    private static void javaParameters(Path profile, List<String> options) throws IOException, InterruptedException {
        Path config = profile.resolve("user").resolve("config");
        Path settings;
        try (Stream<Path> s = Files.list(config)) {
            settings = s.filter(p -> p.getFileName().toString().startsWith("javasettings_")).findFirst()
                    .orElseThrow(() -> new IllegalStateException("no Java settings in " + config));
        }
        String xml = new String(Files.readAllBytes(settings), java.nio.charset.StandardCharsets.UTF_8);
        StringBuilder params = new StringBuilder("<vmParameters xsi:nil=\"false\">");
        for (String o : options) {
            params.append("<param>").append(o.replace("&", "&amp;").replace("<", "&lt;")).append("</param>");
        }
        params.append("</vmParameters>");
        String changed = xml.replaceFirst("<vmParameters[^>]*/>|<vmParameters[^>]*>.*?</vmParameters>",
                java.util.regex.Matcher.quoteReplacement(params.toString()));
        if (changed.equals(xml)) {
            throw new IllegalStateException("no vmParameters element in " + settings);
        }
        Files.write(settings, changed.getBytes(java.nio.charset.StandardCharsets.UTF_8));
        handOver(settings);
    }

    /** An office on an existing profile (used to reopen after a restart). */
    static Office launch(Path base, Path profile) throws Exception {
        int port;
        try (ServerSocket s = new ServerSocket(0)) {
            port = s.getLocalPort();
        }
        List<String> cmd = command(program().resolve("soffice").toString(), "--headless", "--invisible", "--nologo",
                "--norestore", "--nodefault", "--nolockcheck", "-env:UserInstallation=" + profile.toUri(),
                "--accept=socket,host=127.0.0.1,port=" + port + ",tcpNoDelay=1;urp;");
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true)
                .redirectOutput(base.resolve("soffice.log").toFile()).redirectInput(ProcessBuilder.Redirect.from(
                        new File("/dev/null")));
        pb.environment().put("HOME", base.resolve("home").toString());
        officeEnvironment(pb);
        Process p = pb.start();
        try {
            XComponentContext local = Bootstrap.createInitialComponentContext(null);
            XMultiComponentFactory lsm = local.getServiceManager();
            XUnoUrlResolver resolver = UnoRuntime.queryInterface(XUnoUrlResolver.class,
                    lsm.createInstanceWithContext("com.sun.star.bridge.UnoUrlResolver", local));
            String url = "uno:socket,host=127.0.0.1,port=" + port + ";urp;StarOffice.ComponentContext";
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(90);
            while (true) {
                try {
                    XComponentContext ctx = UnoRuntime.queryInterface(XComponentContext.class, resolver.resolve(url));
                    Object d = ctx.getServiceManager().createInstanceWithContext("com.sun.star.frame.Desktop", ctx);
                    return new Office(base, profile, p, ctx, UnoRuntime.queryInterface(XDesktop.class, d));
                } catch (com.sun.star.connection.NoConnectException | com.sun.star.lang.DisposedException e) {
                    if (System.nanoTime() > deadline || !p.isAlive() && p.exitValue() != 0) {
                        throw new IllegalStateException("office did not accept a connection: " + log(base), e);
                    }
                    Thread.sleep(250);
                }
            }
        } catch (Exception | Error e) {
            kill(p);
            throw e;
        }
    }

    /** The office's own process (soffice.bin, which also hosts the office's JVM), among those this class started. */
    public ProcessHandle officeProcess() {
        return process.descendants().filter(h -> h.info().command().map(c -> c.endsWith("soffice.bin")).orElse(false))
                .findFirst().orElseThrow(() -> new IllegalStateException("no soffice.bin among the started processes"));
    }

    public XComponentContext context() {
        return context;
    }

    public Path directory() {
        return base;
    }

    public Path profile() {
        return profile;
    }

    /** Copies a file into the office's own directory (readable by the office's user) and returns the copy. */
    public Path stage(Path file) throws IOException, InterruptedException {
        Path copy = base.resolve(file.getFileName().toString());
        Files.copy(file, copy, StandardCopyOption.REPLACE_EXISTING);
        handOver(copy);
        return copy;
    }

    /** A writable location for the office to save into. */
    public Path scratch(String name) throws IOException, InterruptedException {
        Path dir = base.resolve("out");
        if (!Files.exists(dir)) {
            Files.createDirectories(dir);
            handOver(dir);
        }
        return dir.resolve(name);
    }

    public XComponent load(Path file) throws Exception {
        XComponentLoader loader = UnoRuntime.queryInterface(XComponentLoader.class, desktop);
        return loader.loadComponentFromURL(file.toUri().toString(), "_blank", 0,
                new PropertyValue[] {property("Hidden", Boolean.TRUE)});
    }

    public XComponent newSpreadsheet() throws Exception {
        XComponentLoader loader = UnoRuntime.queryInterface(XComponentLoader.class, desktop);
        return loader.loadComponentFromURL("private:factory/scalc", "_blank", 0,
                new PropertyValue[] {property("Hidden", Boolean.TRUE)});
    }

    public Object service(String name) throws Exception {
        return context.getServiceManager().createInstanceWithContext(name, context);
    }

    public static PropertyValue property(String name, Object value) {
        PropertyValue p = new PropertyValue();
        p.Name = name;
        p.Value = value;
        return p;
    }

    /** Terminates the office through its desktop, then ends whatever this class started that is still alive. */
    @Override
    public void close() {
        if (!closed.compareAndSet(false, true)) {
            return;
        }
        try {
            desktop.terminate();
        } catch (RuntimeException e) {
            // the bridge dies with the office; the processes are ended below either way
        }
        try {
            process.waitFor(15, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        kill(process);
    }

    /** Closes the office and deletes its directory. */
    public void dispose() {
        close();
        delete(base);
    }

    private static void kill(Process p) {
        List<ProcessHandle> all = new ArrayList<>();
        p.descendants().forEach(all::add);
        all.add(p.toHandle());
        for (ProcessHandle h : all) {
            h.destroy();
        }
        for (ProcessHandle h : all) {
            try {
                h.onExit().get(5, TimeUnit.SECONDS);
            } catch (Exception e) {
                h.destroyForcibly();
            }
        }
    }

    static void delete(Path dir) {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(f -> f.toFile().delete());
        } catch (IOException e) {
            // a leftover temp directory is harmless
        }
    }

    /** Makes a path usable by the office's user. */
    static void handOver(Path p) throws IOException, InterruptedException {
        if (asRoot()) {
            run(p.getParent(), 60, "chown", "-R", NOBODY + ":" + NOBODY, p.toString());
        }
    }

    private static List<String> command(String... args) {
        List<String> cmd = new ArrayList<>();
        if (asRoot()) {
            cmd.addAll(Arrays.asList("setpriv", "--reuid=" + NOBODY, "--regid=" + NOBODY, "--clear-groups", "--"));
        }
        cmd.addAll(Arrays.asList(args));
        return cmd;
    }

    /** Runs a command (as the office's user when it is an office tool) and fails on a non-zero exit or time-out. */
    static String run(Path dir, int seconds, String... args) throws IOException, InterruptedException {
        boolean officeTool = args[0].startsWith(program().toString());
        List<String> cmd = officeTool ? command(args) : Arrays.asList(args);
        Path out = Files.createTempFile("miscela-cmd-", ".log");
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(out.toFile())
                .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null")));
        if (officeTool) {
            pb.environment().put("HOME", dir.resolve("home").toString());
            officeEnvironment(pb);
        }
        Process p = pb.start();
        boolean done = p.waitFor(seconds, TimeUnit.SECONDS);
        if (!done) {
            kill(p);
        }
        String text = new String(Files.readAllBytes(out), java.nio.charset.StandardCharsets.UTF_8);
        Files.deleteIfExists(out);
        if (!done || p.exitValue() != 0) {
            throw new IllegalStateException(String.join(" ", cmd) + (done ? " exited " + p.exitValue()
                    : " timed out") + ":\n" + text);
        }
        return text;
    }

    private static String log(Path base) {
        try {
            return new String(Files.readAllBytes(base.resolve("soffice.log")), java.nio.charset.StandardCharsets.UTF_8);
        } catch (IOException e) {
            return "(no log)";
        }
    }
}
