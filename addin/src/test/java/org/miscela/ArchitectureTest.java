package org.miscela;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.DataInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The core is a plain Java library: no office type may appear in its sources or its compiled classes. And the add-in
 * has no side channels: nothing in the core or the adapter touches files, the network, processes, the environment,
 * class loading, reflection, scripting or serialization, in the sources or in the compiled constant pools, so
 * nothing a cell holds can make it read, write, connect, start or load anything.
 */
class ArchitectureTest {
    private static final Path CORE_SOURCES = Paths.get("src/main/java/org/miscela/core");
    private static final Path CORE_CLASSES = Paths.get("target/classes/org/miscela/core");

    @Test
    void coreSourcesImportNothingFromTheOffice() throws IOException {
        List<Path> offenders = files(CORE_SOURCES, ".java").stream()
                .filter(p -> read(p).contains("com.sun.star")).collect(Collectors.toList());
        assertTrue(files(CORE_SOURCES, ".java").size() > 5, "core sources not found");
        assertTrue(offenders.isEmpty(), "core sources mention com.sun.star: " + offenders);
    }

    /** The compiled constant pools name every referenced class, so this also catches fully qualified uses. */
    @Test
    void coreClassesReferenceNothingFromTheOffice() throws IOException {
        List<Path> classes = files(CORE_CLASSES, ".class");
        assertTrue(classes.size() > 5, "core classes not found");
        List<Path> offenders = classes.stream().filter(p -> read(p).contains("com/sun/star"))
                .collect(Collectors.toList());
        assertTrue(offenders.isEmpty(), "core classes reference com/sun/star: " + offenders);
    }

    // ------------------------------------------------------------------ no side channels

    private static final Path MAIN_SOURCES = Paths.get("src/main/java/org/miscela");
    private static final Path MAIN_CLASSES = Paths.get("target/classes/org/miscela");
    /**
     * The one exception: the build runs MetadataWriter (exec-maven-plugin, process-classes) to write CalcAddIns.xcu
     * and docs/functions.md from the function catalogue. It is a command-line tool of the build that the add-in never
     * calls at run time, which {@link #nothingElseReachesTheMetadataWriter} checks.
     */
    private static final String BUILD_TOOL = "calc/meta/MetadataWriter";

    /**
     * Source texts that would open a side channel: files and channels, the network, processes, the environment and
     * system properties (results must depend on cell content only), native code, class loading, reflection and
     * method handles, scripting engines, serialization, service loading, JNDI/RMI/SQL, and the office's own routes to
     * files, documents, the shell, scripts and service creation by name.
     */
    private static final String[] FORBIDDEN_SOURCE = {"java.io.File", "RandomAccessFile", "java.nio.file",
        "java.nio.channels", "java.net.", "URLConnection", "ProcessBuilder", "Runtime.getRuntime", ".exec(",
        "System.getenv", "System.getProperty", "System.load", "loadLibrary", "Class.forName", "ClassLoader",
        "java.lang.reflect", "getDeclaredMethod", "getDeclaredField", "getDeclaredConstructor", ".newInstance(",
        "MethodHandles", "java.lang.invoke", "javax.script", "ScriptEngine", "ObjectInputStream",
        "ObjectOutputStream", "readObject", "Externalizable", "ServiceLoader", "javax.naming", "java.rmi",
        "java.sql", "java.awt", "sun.misc", "jdk.internal", "com.sun.star.ucb", "com.sun.star.io.",
        "com.sun.star.frame", "com.sun.star.system", "com.sun.star.script", "com.sun.star.bridge",
        "com.sun.star.connection", "com.sun.star.sdbc", "com.sun.star.loader", "XMultiServiceFactory",
        "XMultiComponentFactory", "createInstance"};

    /**
     * Classes that no compiled class may refer to, for the same reasons: by internal name (with its nested classes), or
     * every class of a package where the entry ends in '/'. Not
     * java/lang/invoke as a whole: every lambda and string concatenation the compiler emits names its bootstrap
     * (LambdaMetafactory, StringConcatFactory, MethodHandles$Lookup); the code's own use of method handles is caught
     * by {@link #FORBIDDEN_METHODS}.
     */
    private static final String[] FORBIDDEN_CLASSES = {"java/io/File", "java/io/FileInputStream",
        "java/io/FileOutputStream", "java/io/FileReader", "java/io/FileWriter", "java/io/FileDescriptor",
        "java/io/RandomAccessFile", "java/io/PrintStream", "java/io/Console",
        "java/io/ObjectInputStream", "java/io/ObjectOutputStream", "java/io/Externalizable", "java/nio/file/",
        "java/nio/channels/", "java/net/", "java/lang/ProcessBuilder", "java/lang/Process", "java/lang/ProcessHandle",
        "java/lang/Runtime",
        "java/lang/ClassLoader", "java/lang/reflect/", "javax/script/",
        "java/util/ServiceLoader", "javax/naming/", "java/rmi/", "java/sql/", "java/awt/", "sun/", "jdk/internal/",
        "com/sun/star/ucb/", "com/sun/star/io/", "com/sun/star/frame/", "com/sun/star/system/",
        "com/sun/star/script/", "com/sun/star/bridge/", "com/sun/star/connection/", "com/sun/star/sdbc/",
        "com/sun/star/loader/", "com/sun/star/lang/XMultiServiceFactory",
        "com/sun/star/lang/XMultiComponentFactory"};

    /**
     * Methods (by prefix of "owner.name") of allowed classes that load or reach by name. Class.getName and
     * getEnumConstants stay allowed: they read a class known at compile time (a class literal), never one named by
     * data.
     */
    private static final String[] FORBIDDEN_METHODS = {"java/lang/invoke/MethodHandles.lookup",
        "java/lang/invoke/MethodHandles.publicLookup", "java/lang/invoke/MethodHandles.privateLookupIn",
        "java/lang/invoke/MethodHandles$Lookup.find", "java/lang/invoke/MethodHandles$Lookup.unreflect",
        "java/lang/invoke/MethodHandle.invoke", "java/lang/Class.forName", "java/lang/Class.newInstance",
        "java/lang/Class.getMethod", "java/lang/Class.getMethods", "java/lang/Class.getDeclaredMethod",
        "java/lang/Class.getDeclaredMethods", "java/lang/Class.getField", "java/lang/Class.getFields",
        "java/lang/Class.getDeclaredField", "java/lang/Class.getDeclaredFields", "java/lang/Class.getConstructor",
        "java/lang/Class.getConstructors", "java/lang/Class.getDeclaredConstructor",
        "java/lang/Class.getDeclaredConstructors", "java/lang/Class.getClassLoader", "java/lang/Class.getResource",
        "java/lang/Class.getResourceAsStream", "java/lang/Thread.getContextClassLoader", "java/lang/System.getenv",
        "java/lang/System.getProperty", "java/lang/System.getProperties", "java/lang/System.setProperty",
        "java/lang/System.load", "java/lang/System.loadLibrary", "java/lang/System.exit",
        "java/lang/System.setSecurityManager"};

    @Test
    void mainSourcesOpenNoSideChannel() throws IOException {
        List<Path> sources = files(MAIN_SOURCES, ".java").stream()
                .filter(p -> p.startsWith(MAIN_SOURCES.resolve("core")) || p.startsWith(MAIN_SOURCES.resolve("calc")))
                .collect(Collectors.toList());
        assertTrue(sources.size() > 30, "main sources not found");
        List<String> offenders = new ArrayList<>();
        for (Path p : sources) {
            if (p.toString().replace('\\', '/').endsWith(BUILD_TOOL + ".java")) {
                continue;
            }
            String text = read(p);
            for (String token : FORBIDDEN_SOURCE) {
                if (text.contains(token)) {
                    offenders.add(p + ": " + token);
                }
            }
        }
        assertEquals(List.of(), offenders, "side channels in the add-in's sources");
    }

    /** The constant pools name every class and member a class uses, also those written fully qualified. */
    @Test
    void compiledClassesOpenNoSideChannel() throws IOException {
        List<Path> classes = runtimeClasses();
        assertTrue(classes.size() > 30, "compiled classes not found");
        List<String> offenders = new ArrayList<>();
        for (Path p : classes) {
            offenders.addAll(sideChannels(p));
        }
        assertEquals(List.of(), offenders, "side channels in the add-in's classes");
    }

    @Test
    void nothingElseReachesTheMetadataWriter() throws IOException {
        List<String> callers = new ArrayList<>();
        for (Path p : runtimeClasses()) {
            if (ConstantPool.of(p).classes.stream().anyMatch(c -> c.startsWith("org/miscela/" + BUILD_TOOL))) {
                callers.add(p.toString());
            }
        }
        assertEquals(List.of(), callers, "classes of the add-in that refer to the build's MetadataWriter");
    }

    /** The scan is not blind: it finds the file writing of the one class allowed to write files. */
    @Test
    void theScanFindsTheBuildToolsFileAccess() throws IOException {
        List<String> found = sideChannels(MAIN_CLASSES.resolve(BUILD_TOOL + ".class"));
        assertTrue(found.stream().anyMatch(f -> f.contains("java/nio/file/Files")), found::toString);
        String text = read(MAIN_SOURCES.resolve(BUILD_TOOL + ".java"));
        assertTrue(Arrays.stream(FORBIDDEN_SOURCE).anyMatch(text::contains), "the source scan sees java.nio.file");
    }

    /** Every compiled class of the core and the adapter, except the build tool. */
    private static List<Path> runtimeClasses() throws IOException {
        return files(MAIN_CLASSES, ".class").stream()
                .filter(p -> p.startsWith(MAIN_CLASSES.resolve("core")) || p.startsWith(MAIN_CLASSES.resolve("calc")))
                .filter(p -> !p.toString().replace('\\', '/').endsWith(BUILD_TOOL + ".class"))
                .collect(Collectors.toList());
    }

    private static List<String> sideChannels(Path classFile) throws IOException {
        ConstantPool pool = ConstantPool.of(classFile);
        List<String> out = new ArrayList<>();
        for (String c : pool.classes) {
            for (String f : FORBIDDEN_CLASSES) {
                if (f.endsWith("/") ? c.startsWith(f) : c.equals(f) || c.startsWith(f + "$")) {
                    out.add(classFile + ": class " + c);
                }
            }
        }
        for (String m : pool.members) {
            for (String f : FORBIDDEN_METHODS) {
                if (m.startsWith(f)) {
                    out.add(classFile + ": method " + m);
                }
            }
        }
        return out;
    }

    /** The classes and members a class file refers to, read from its constant pool (JVMS §4.4). */
    private static final class ConstantPool {
        final List<String> classes = new ArrayList<>();
        /** "owner/Class.member" for every field and method reference. */
        final List<String> members = new ArrayList<>();

        static ConstantPool of(Path classFile) throws IOException {
            DataInputStream in = new DataInputStream(new ByteArrayInputStream(Files.readAllBytes(classFile)));
            if (in.readInt() != 0xCAFEBABE) {
                throw new IOException(classFile + " is not a class file");
            }
            in.readUnsignedShort(); // minor version
            in.readUnsignedShort(); // major version
            int count = in.readUnsignedShort();
            String[] utf8 = new String[count];
            int[] classNames = new int[count];
            int[][] refs = new int[count][];
            int[][] nameAndTypes = new int[count][];
            for (int i = 1; i < count; i++) {
                int tag = in.readUnsignedByte();
                switch (tag) {
                    case 1:
                        utf8[i] = in.readUTF();
                        break;
                    case 7:
                        classNames[i] = in.readUnsignedShort();
                        break;
                    case 9: case 10: case 11:
                        refs[i] = new int[] {in.readUnsignedShort(), in.readUnsignedShort()};
                        break;
                    case 12:
                        nameAndTypes[i] = new int[] {in.readUnsignedShort(), in.readUnsignedShort()};
                        break;
                    case 3: case 4: case 17: case 18:
                        in.readInt();
                        break;
                    case 5: case 6:
                        in.readLong();
                        i++; // takes two entries
                        break;
                    case 8: case 16: case 19: case 20:
                        in.readUnsignedShort();
                        break;
                    case 15:
                        in.readUnsignedByte();
                        in.readUnsignedShort();
                        break;
                    default:
                        throw new IOException(classFile + ": unknown constant pool tag " + tag);
                }
            }
            ConstantPool pool = new ConstantPool();
            for (int i = 1; i < count; i++) {
                if (classNames[i] > 0) {
                    // array classes are named by descriptor, "[Ljava/io/File;": keep the element class
                    pool.classes.add(utf8[classNames[i]].replaceFirst("^\\[+L?", "").replaceFirst(";$", ""));
                }
                if (refs[i] != null) {
                    String owner = utf8[classNames[refs[i][0]]];
                    pool.members.add(owner + "." + utf8[nameAndTypes[refs[i][1]][0]]);
                }
            }
            return pool;
        }
    }

    private static List<Path> files(Path dir, String suffix) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(p -> p.toString().endsWith(suffix)).collect(Collectors.toList());
        }
    }

    private static String read(Path p) {
        try {
            return new String(Files.readAllBytes(p), StandardCharsets.ISO_8859_1);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
