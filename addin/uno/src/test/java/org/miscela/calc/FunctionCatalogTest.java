package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.reflect.Method;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.tools.MetadataWriter;

/** The catalogue, the IDL, the generated Java interface and the generated docs must agree exactly. */
class FunctionCatalogTest {
    private static final Pattern METHOD = Pattern.compile("(\\w+)\\s+(\\w+)\\s*\\(([^)]*)\\)", Pattern.DOTALL);
    private static final Pattern PARAM = Pattern.compile("\\[in\\]\\s+(.+?)\\s+(\\w+)\\s*$", Pattern.DOTALL);

    /** Methods and parameter names in IDL order, read from idl/…/XMixtureFunctions.idl. */
    private static List<String[]> idlMethods() throws IOException {
        String idl = new String(Files.readAllBytes(Paths.get("../../idl/org/miscela/calc/XMixtureFunctions.idl")),
                StandardCharsets.UTF_8);
        String body = idl.substring(idl.indexOf("interface XMixtureFunctions"));
        body = body.replaceAll("(?s)/\\*\\*.*?\\*/", " ");
        List<String[]> out = new ArrayList<>();
        Matcher m = METHOD.matcher(body.substring(body.indexOf('{') + 1));
        while (m.find()) {
            List<String> names = new ArrayList<>();
            names.add(m.group(2));
            for (String p : m.group(3).split(",(?![^<]*>)")) {
                Matcher pm = PARAM.matcher(p.trim());
                assertTrue(pm.find(), "cannot read parameter " + p);
                names.add(pm.group(2));
            }
            out.add(names.toArray(new String[0]));
        }
        return out;
    }

    @Test
    void catalogueMatchesTheIdl() throws IOException {
        List<String[]> idl = idlMethods();
        List<FunctionInfo> cat = FunctionCatalog.functions();
        assertEquals(idl.size(), cat.size(), "number of functions");
        for (int i = 0; i < idl.size(); i++) {
            String[] m = idl.get(i);
            FunctionInfo f = cat.get(i);
            assertEquals(m[0], f.method(), "function " + i);
            List<String> args = new ArrayList<>();
            for (ArgumentInfo a : f.arguments()) {
                args.add(a.name());
            }
            assertEquals(Arrays.asList(m).subList(1, m.length), args, "arguments of " + f.method());
        }
    }

    /** Every IDL method carries a doc comment with an @param per parameter. */
    @Test
    void idlIsDocumented() throws IOException {
        String idl = new String(Files.readAllBytes(Paths.get("../../idl/org/miscela/calc/XMixtureFunctions.idl")),
                StandardCharsets.UTF_8);
        for (FunctionInfo f : FunctionCatalog.functions()) {
            int at = idl.indexOf(" " + f.method() + "(");
            String before = idl.substring(0, at);
            String doc = before.substring(before.lastIndexOf("/**"));
            for (ArgumentInfo a : f.arguments()) {
                assertTrue(doc.contains("@param " + a.name() + " "), f.method() + " lacks @param " + a.name());
            }
        }
    }

    /** The javamaker-generated interface (from the type library) has the same methods and parameter counts. */
    @Test
    void catalogueMatchesTheGeneratedInterface() {
        Set<String> seen = new HashSet<>();
        for (Method m : XMixtureFunctions.class.getDeclaredMethods()) {
            if (m.isSynthetic()) {
                continue;
            }
            FunctionInfo f = FunctionCatalog.byMethod(m.getName());
            assertEquals(f.arguments().size(), m.getParameterCount(), m.getName());
            seen.add(m.getName());
        }
        assertEquals(FunctionCatalog.functions().size(), seen.size());
    }

    @Test
    void everyFunctionAndArgumentIsDescribed() {
        Set<String> names = new HashSet<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            assertTrue(f.displayName().startsWith("MIX."), f.displayName());
            assertTrue(names.add(f.displayName()), "duplicate " + f.displayName());
            assertFalse(f.summary().trim().isEmpty(), f.method());
            assertFalse(f.example().trim().isEmpty(), f.method());
            for (ArgumentInfo a : f.arguments()) {
                assertFalse(a.description().trim().isEmpty(), f.method() + "." + a.name());
                assertFalse(a.displayName().trim().isEmpty(), f.method() + "." + a.name());
            }
        }
    }

    @Test
    void xcuNamesEveryFunctionAndParameter() {
        String xcu = MetadataWriter.calcAddInsXcu();
        assertTrue(xcu.contains("<node oor:name=\"" + FunctionCatalog.SERVICE + "\""));
        for (FunctionInfo f : FunctionCatalog.functions()) {
            int at = xcu.indexOf("<node oor:name=\"" + f.method() + "\"");
            assertTrue(at > 0, f.method());
            for (ArgumentInfo a : f.arguments()) {
                assertTrue(xcu.indexOf("<node oor:name=\"" + a.name() + "\"", at) > at, f.method() + "." + a.name());
            }
        }
    }

    /**
     * Every function node of the XCU carries a CompatibilityName (schema: org.openoffice.Office.CalcAddIns, template
     * AddInFunction, property CompatibilityName, xs:string, localised), equal to the display name and unique: Calc
     * stores an add-in call in .xls files under that name and finds the function by it on reload; without it the
     * call is stored as a macro name and reopens as #MACRO? (Err:531). {@code CalcAddInsRoundTripIT} checks the
     * reload in a real office.
     */
    @Test
    void xcuGivesEveryFunctionItsCompatibilityName() throws Exception {
        javax.xml.parsers.DocumentBuilderFactory factory = javax.xml.parsers.DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        org.w3c.dom.Document xcu = factory.newDocumentBuilder().parse(new org.xml.sax.InputSource(
                new java.io.StringReader(MetadataWriter.calcAddInsXcu())));
        String oor = "http://openoffice.org/2001/registry";
        org.w3c.dom.Element functions = null;
        org.w3c.dom.NodeList nodes = xcu.getElementsByTagName("node");
        for (int i = 0; i < nodes.getLength(); i++) {
            org.w3c.dom.Element e = (org.w3c.dom.Element) nodes.item(i);
            if ("AddInFunctions".equals(e.getAttributeNS(oor, "name"))) {
                functions = e;
            }
        }
        assertTrue(functions != null, "no AddInFunctions node");
        Set<String> compatibilityNames = new HashSet<>();
        int seen = 0;
        for (org.w3c.dom.Node n = functions.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (!(n instanceof org.w3c.dom.Element)) {
                continue;
            }
            org.w3c.dom.Element function = (org.w3c.dom.Element) n;
            FunctionInfo f = FunctionCatalog.byMethod(function.getAttributeNS(oor, "name"));
            List<String> values = new ArrayList<>();
            for (org.w3c.dom.Node c = function.getFirstChild(); c != null; c = c.getNextSibling()) {
                if (c instanceof org.w3c.dom.Element && "prop".equals(c.getLocalName())
                        && "CompatibilityName".equals(((org.w3c.dom.Element) c).getAttributeNS(oor, "name"))) {
                    org.w3c.dom.Element value = (org.w3c.dom.Element) ((org.w3c.dom.Element) c)
                            .getElementsByTagName("value").item(0);
                    assertEquals("en-US", value.getAttributeNS(javax.xml.XMLConstants.XML_NS_URI, "lang"),
                            f.method() + ": CompatibilityName is localised like LibreOffice's own add-ins'");
                    values.add(value.getTextContent());
                }
            }
            assertEquals(Arrays.asList(f.displayName()), values, f.method() + ": exactly one CompatibilityName");
            assertTrue(compatibilityNames.add(values.get(0).toUpperCase(java.util.Locale.ROOT)),
                    "duplicate CompatibilityName " + values.get(0));
            seen++;
        }
        assertEquals(FunctionCatalog.functions().size(), seen, "function nodes in the XCU");
    }

    /** The README's function list names every function with its exact syntax, and nothing else. */
    @Test
    void readmeListsEveryFunction() throws IOException {
        String readme = new String(Files.readAllBytes(Paths.get("../../README.md")), StandardCharsets.UTF_8);
        for (FunctionInfo f : FunctionCatalog.functions()) {
            assertTrue(readme.contains("| `" + MetadataWriter.syntax(f) + "` |"),
                    "README lacks the row for " + MetadataWriter.syntax(f));
        }
        Matcher rows = Pattern.compile("(?m)^\\| `MIX\\.").matcher(readme);
        int count = 0;
        while (rows.find()) {
            count++;
        }
        assertEquals(FunctionCatalog.functions().size(), count, "function rows in the README");
    }

    @Test
    void functionReferenceIsUpToDate() throws IOException {
        String committed = new String(Files.readAllBytes(Paths.get("../../docs/functions.md")), StandardCharsets.UTF_8);
        assertEquals(MetadataWriter.functionReference(), committed,
                "docs/functions.md is out of date: run scripts/regenerate-docs");
    }

    @Test
    void errorCatalogueIsUpToDate() throws IOException {
        String committed = new String(Files.readAllBytes(Paths.get("../../docs/errors.md")), StandardCharsets.UTF_8);
        assertEquals(MetadataWriter.errorCatalogue(), committed,
                "docs/errors.md is out of date: run scripts/regenerate-docs");
    }

    /**
     * Every problem a call (rather than a card) can raise is listed under at least one function in the reference, or
     * declared not reachable from a cell, and never both.
     */
    @Test
    void everyCallProblemIsListedUnderAFunctionOrDeclaredUnreachable() {
        java.util.Set<Enum<?>> listed = new java.util.HashSet<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            listed.addAll(f.errors());
        }
        java.util.List<Enum<?>> missing = new java.util.ArrayList<>();
        java.util.List<Enum<?>> both = new java.util.ArrayList<>();
        for (Enum<?> p : FunctionCatalog.callProblems()) {
            boolean unreachable = FunctionCatalog.notFromACell().containsKey(p);
            if (!listed.contains(p) && !unreachable) {
                missing.add(p);
            }
            if (listed.contains(p) && unreachable) {
                both.add(p);
            }
        }
        assertTrue(missing.isEmpty(), "problems no function lists: " + missing);
        assertTrue(both.isEmpty(), "problems listed under a function but declared not reachable from a cell: " + both);
        assertTrue(FunctionCatalog.callProblems().containsAll(FunctionCatalog.notFromACell().keySet()),
                "only call problems are declared not reachable from a cell");
    }
}
