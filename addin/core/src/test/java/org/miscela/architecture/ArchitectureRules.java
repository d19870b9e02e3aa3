package org.miscela.architecture;

import static com.tngtech.archunit.base.DescribedPredicate.describe;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.belongToAnyOf;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaCall;
import com.tngtech.archunit.lang.ArchRule;
import java.util.Arrays;
import java.util.List;

/**
 * The rules every shipped class keeps (the core and the UNO adapter; not the build tools, not the tests), written once
 * for both modules' architecture tests. The add-in has no side channels: nothing in it touches files, the network,
 * processes, the environment or system properties (results depend on cell content only), native code, class loading,
 * reflection, scripting, serialization, service loading, JNDI/RMI/SQL, AWT, or the office's own routes to files,
 * documents, the shell, scripts and service creation by name.
 */
public final class ArchitectureRules {
    /** Whole packages no shipped class may use. */
    static final String[] FORBIDDEN_PACKAGES = {"java.nio.file..", "java.nio.channels..", "java.net..",
        "java.lang.reflect..", "javax.script..", "javax.naming..", "java.rmi..", "java.sql..", "java.awt..",
        "javax.swing..", "sun..", "jdk.internal..", "com.sun.star.ucb..", "com.sun.star.io..", "com.sun.star.frame..",
        "com.sun.star.system..", "com.sun.star.script..", "com.sun.star.bridge..", "com.sun.star.connection..",
        "com.sun.star.sdbc..", "com.sun.star.loader.."};

    /** Single classes (with their nested classes) no shipped class may use. */
    static final Class<?>[] FORBIDDEN_CLASSES = {java.io.File.class, java.io.FileInputStream.class,
        java.io.FileOutputStream.class, java.io.FileReader.class, java.io.FileWriter.class,
        java.io.FileDescriptor.class, java.io.RandomAccessFile.class, java.io.PrintStream.class, java.io.Console.class,
        java.io.ObjectInputStream.class, java.io.ObjectOutputStream.class, java.io.Externalizable.class,
        ProcessBuilder.class, Process.class, ProcessHandle.class, Runtime.class, ClassLoader.class,
        java.util.ServiceLoader.class};

    /** Names of office classes (not on the core's class path) no shipped class may use. */
    static final List<String> FORBIDDEN_OFFICE_CLASSES = Arrays.asList("com.sun.star.lang.XMultiServiceFactory",
        "com.sun.star.lang.XMultiComponentFactory");

    /**
     * Methods, as "owner.name" prefixes, of allowed classes that load or reach something by name. Class.getName and
     * getEnumConstants stay allowed: they read a class known at compile time, never one named by data.
     */
    static final List<String> FORBIDDEN_METHODS = Arrays.asList("java.lang.invoke.MethodHandles.lookup",
        "java.lang.invoke.MethodHandles.publicLookup", "java.lang.invoke.MethodHandles.privateLookupIn",
        "java.lang.invoke.MethodHandles$Lookup.find", "java.lang.invoke.MethodHandles$Lookup.unreflect",
        "java.lang.invoke.MethodHandle.invoke", "java.lang.Class.forName", "java.lang.Class.newInstance",
        "java.lang.Class.getMethod", "java.lang.Class.getDeclaredMethod", "java.lang.Class.getField",
        "java.lang.Class.getDeclaredField", "java.lang.Class.getConstructor", "java.lang.Class.getDeclaredConstructor",
        "java.lang.Class.getClassLoader", "java.lang.Class.getResource", "java.lang.Thread.getContextClassLoader",
        "java.lang.System.getenv", "java.lang.System.getProperty", "java.lang.System.getProperties",
        "java.lang.System.setProperty", "java.lang.System.load", "java.lang.System.exit",
        "java.lang.System.setSecurityManager");

    /**
     * The one reader of the add-in's own resources: the card library loads its index and every card it lists, under a
     * fixed root, whole on first use; a cell only chooses among the cards already loaded, never names a resource.
     */
    static final String LIBRARY_READER = "org.miscela.core.library.CardLibrary";

    private ArchitectureRules() {
    }

    /** No side channel: the forbidden packages, classes and by-name methods. */
    public static ArchRule noSideChannels() {
        return noClasses().should().dependOnClassesThat(resideInAnyPackage(FORBIDDEN_PACKAGES))
                .orShould().dependOnClassesThat(belongToAnyOf(FORBIDDEN_CLASSES))
                .orShould().dependOnClassesThat(describe("are office factories",
                        c -> FORBIDDEN_OFFICE_CLASSES.contains(c.getName())))
                .orShould().callMethodWhere(describe("the method loads, reflects or reads the environment",
                        (JavaCall<?> call) -> {
                            String key = call.getTargetOwner().getName() + "." + call.getName();
                            if (key.equals("java.lang.Class.getResourceAsStream")
                                    && call.getOriginOwner().getName().equals(LIBRARY_READER)) {
                                return false;
                            }
                            return FORBIDDEN_METHODS.stream().anyMatch(key::startsWith);
                        }))
                .because("results must depend on cell content only, and nothing a cell holds may make the add-in "
                        + "read, write, connect, start or load anything");
    }
}
