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
import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.lib.uno.typeinfo.MethodTypeInfo;
import com.sun.star.lib.uno.typeinfo.TypeInfo;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.catalog.IdlType;
import org.miscela.tools.IdlWriter;
import org.miscela.tools.MetadataWriter;

/**
 * The catalogue is the one source of every function's signature and texts: the committed IDL, the README's function
 * table and the docs must be exactly what the generators make of it, and the Java interface javamaker made from the
 * type library must have its methods, types and exceptions.
 */
class FunctionCatalogTest {
    private static String committed(String path) throws IOException {
        return new String(Files.readAllBytes(Paths.get("../..", path)), StandardCharsets.UTF_8);
    }

    /** The IDL in full: names, order, types, results, raises clauses and doc comments. */
    @Test
    void theIdlIsTheCataloguesOwn() throws IOException {
        assertEquals(IdlWriter.interfaceIdl(), committed(IdlWriter.PATH),
                IdlWriter.PATH + " is out of date: run scripts/regenerate-docs (method names are permanent: add, "
                        + "never rename)");
    }

    /**
     * The javamaker-generated interface (from the type library built out of the IDL) has the catalogue's methods in
     * its order, each parameter's Java type that of its IDL type, the result type, and the exception.
     */
    @Test
    void theGeneratedInterfaceHasTheCataloguesSignatures() throws Exception {
        List<String> order = new ArrayList<>();
        for (TypeInfo t : (TypeInfo[]) XMixtureFunctions.class.getField("UNOTYPEINFO").get(null)) {
            if (t instanceof MethodTypeInfo) {
                order.add(t.getName());
            }
        }
        List<String> methods = new ArrayList<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            methods.add(f.method());
        }
        assertEquals(methods, order, "the interface's methods in order");
        int declared = 0;
        for (Method m : XMixtureFunctions.class.getDeclaredMethods()) {
            if (m.isSynthetic()) {
                continue;
            }
            declared++;
            FunctionInfo f = FunctionCatalog.byMethod(m.getName());
            List<Class<?>> expected = new ArrayList<>();
            for (ArgumentInfo a : f.arguments()) {
                expected.add(javaType(a.type()));
            }
            assertEquals(expected, Arrays.asList(m.getParameterTypes()), m.getName() + "'s parameters");
            assertEquals(javaType(f.returnType()), m.getReturnType(), m.getName() + "'s result");
            assertEquals(f.raisesIllegalArgument() ? List.of(IllegalArgumentException.class) : List.of(),
                    Arrays.asList(m.getExceptionTypes()), m.getName() + "'s exceptions");
        }
        assertEquals(FunctionCatalog.functions().size(), declared, "methods of the interface");
    }

    /** What javamaker makes of each IDL type. */
    private static Class<?> javaType(IdlType type) {
        switch (type) {
            case RANGE:
                return Object[][].class;
            case ANY:
                return Object.class;
            case ARGUMENT_LIST:
                return Object[].class;
            case STRING:
                return String.class;
            default:
                throw new AssertionError(type);
        }
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

    /**
     * No required argument is shown as optional in Calc's Function Wizard: Calc shows every {@code any} parameter as
     * "(optional)" (not bold), whatever CalcAddIns.xcu says, and a typed one as required (ArgumentFormsIT and
     * WizardMetadataIT read this from a running office). So every argument the catalogue marks required has an IDL
     * type other than {@code any}, and every {@code any} is optional.
     */
    @Test
    void everyRequiredArgumentIsTyped() {
        List<String> untyped = new ArrayList<>();
        int required = 0;
        for (FunctionInfo f : FunctionCatalog.functions()) {
            for (ArgumentInfo a : f.arguments()) {
                if (!a.optional()) {
                    required++;
                    if (a.type() == IdlType.ANY) {
                        untyped.add(f.displayName() + "." + a.displayName());
                    }
                }
            }
        }
        assertEquals(List.of(), untyped, "required arguments of IDL type any (the wizard shows them as optional)");
        assertTrue(required > 80, "required arguments counted: " + required);
    }

    /**
     * The Function Wizard's argument page shows an argument's description in two lines and cuts the rest ("…"):
     * looked at in LibreOffice 7.4 under Xvfb, 140 to 154 characters of ordinary description text show
     * (DEVELOPERS.md, "The Function Wizard"). The first sentence must say what the argument is, so it must fit with
     * room for a word wrapped early and wide letters: at most {@value #ARGUMENT_FIRST_SENTENCE} characters.
     */
    static final int ARGUMENT_FIRST_SENTENCE = 125;
    /**
     * The function's description stands above the arguments on the same page, in three lines: about 220 characters
     * show; its first sentence may have {@value #SUMMARY_FIRST_SENTENCE}.
     */
    static final int SUMMARY_FIRST_SENTENCE = 190;

    @Test
    void everyFirstSentenceFitsTheWizardsArgumentPage() {
        List<String> tooLong = new ArrayList<>();
        for (FunctionInfo f : FunctionCatalog.functions()) {
            String summary = firstSentence(f.summary());
            if (summary.length() > SUMMARY_FIRST_SENTENCE) {
                tooLong.add(f.displayName() + " (" + summary.length() + "): " + summary);
            }
            for (ArgumentInfo a : f.arguments()) {
                String first = firstSentence(a.description());
                if (first.length() > ARGUMENT_FIRST_SENTENCE) {
                    tooLong.add(f.displayName() + "." + a.displayName() + " (" + first.length() + "): " + first);
                }
            }
        }
        assertEquals(List.of(), tooLong, "first sentences longer than the wizard shows (arguments "
                + ARGUMENT_FIRST_SENTENCE + " characters, functions " + SUMMARY_FIRST_SENTENCE + ")");
    }

    @Test
    void theFirstSentenceEndsAtAFullStopBeforeASpace() {
        assertEquals("One.", firstSentence("One. Two."));
        assertEquals("Values 0.5 and A0..Ak.", firstSentence("Values 0.5 and A0..Ak. More."));
        assertEquals("No full stop", firstSentence("No full stop"));
        // "Optional." alone would hide the meaning behind a word the wizard already shows
        assertTrue(FunctionCatalog.functions().stream().flatMap(f -> f.arguments().stream())
                .noneMatch(a -> a.description().startsWith("Optional")), "the wizard says \"(optional)\" itself");
    }

    /** The text up to and including the first full stop followed by a space or the end. */
    static String firstSentence(String text) {
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '.' && (i + 1 == text.length() || text.charAt(i + 1) == ' ')) {
                return text.substring(0, i + 1);
            }
        }
        return text;
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
     * call is stored as a macro name and reopens as #MACRO? (Err:531). {@code FileFormatRoundTripIT} checks the
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

    /** The README's function table is the catalogue's, between its markers. */
    @Test
    void theReadmeFunctionTableIsUpToDate() throws IOException {
        String readme = committed("README.md");
        assertEquals(MetadataWriter.withFunctionTable(readme), readme,
                "README.md's function table is out of date: run scripts/regenerate-docs");
        assertTrue(readme.contains(MetadataWriter.functionTable()), "the table itself");
    }

    @Test
    void functionReferenceIsUpToDate() throws IOException {
        assertEquals(MetadataWriter.functionReference(), committed("docs/functions.md"),
                "docs/functions.md is out of date: run scripts/regenerate-docs");
    }

    @Test
    void errorCatalogueIsUpToDate() throws IOException {
        assertEquals(MetadataWriter.errorCatalogue(), committed("docs/errors.md"),
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
