package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.jar.JarInputStream;
import java.util.jar.JarEntry;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.junit.jupiter.api.Test;

/** The built .oxt holds what the office needs, names the pom's version, and bundles no office jar. */
class PackageIT {

    private static byte[] entry(ZipFile z, String name) throws IOException {
        ZipEntry e = z.getEntry(name);
        assertNotNull(e, name + " missing from the .oxt");
        try (InputStream in = z.getInputStream(e)) {
            return in.readAllBytes();
        }
    }

    @Test
    void extensionContents() throws Exception {
        try (ZipFile z = new ZipFile(Office.builtExtension().toFile())) {
            String manifest = new String(entry(z, "META-INF/manifest.xml"), StandardCharsets.UTF_8);
            for (String path : new String[] {"miscela.rdb", "miscela.components", "CalcAddIns.xcu"}) {
                assertTrue(manifest.contains("manifest:full-path=\"" + path + "\""), path + " not in the manifest");
                entry(z, path);
            }
            String description = new String(entry(z, "description.xml"), StandardCharsets.UTF_8);
            assertTrue(description.contains("<version value=\"" + System.getProperty("miscela.version") + "\"/>"),
                    "description.xml carries the pom's version");
            assertTrue(description.contains("<identifier value=\"org.miscela.calc\"/>"));
            assertTrue(description.contains("LibreOffice-minimal-version"));
            assertFalse(description.contains("<registration"), "a licence dialog would make unopkg prompt");
            entry(z, "LICENSE.txt");
            String components = new String(entry(z, "miscela.components"), StandardCharsets.UTF_8);
            assertTrue(components.contains("uri=\"miscela.jar\""));

            List<String> classes = new ArrayList<>();
            String registration;
            try (JarInputStream jar = new JarInputStream(new ByteArrayInputStream(entry(z, "miscela.jar")))) {
                registration = jar.getManifest().getMainAttributes().getValue("RegistrationClassName");
                for (JarEntry e = jar.getNextJarEntry(); e != null; e = jar.getNextJarEntry()) {
                    classes.add(e.getName());
                }
            }
            assertEquals("org.miscela.calc.Registration", registration);
            assertTrue(classes.contains("org/miscela/calc/XMixtureFunctions.class"), "generated interface bundled");
            assertTrue(classes.stream().anyMatch(c -> c.startsWith("org/apache/commons/math3/")),
                    "Commons Math travels inside the jar");
            assertFalse(classes.stream().anyMatch(c -> c.startsWith("com/sun/star/")), "office classes bundled");
        }
    }
}
