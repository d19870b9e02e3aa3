package org.miscela.probe;

import com.sun.star.beans.XPropertySet;
import com.sun.star.sheet.XCellRangeAddressable;
import com.sun.star.table.CellRangeAddress;
import com.sun.star.table.XCellRange;
import com.sun.star.uno.Any;
import com.sun.star.uno.Type;
import com.sun.star.uno.UnoRuntime;
import com.sun.star.lib.uno.helper.WeakBase;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/** Functions that do next to nothing (see XBridgeProbe.idl); registered for Calc by the probe's CalcAddIns.xcu. */
public final class BridgeProbe extends WeakBase implements XBridgeProbe {
    public static final String SERVICE = "org.miscela.probe.BridgeProbe";

    /** Identity of every thread seen by countThreads; a thread object stays alive only as long as the set holds it. */
    private static final Set<Thread> THREADS = ConcurrentHashMap.newKeySet();

    @Override
    public double echoNumber(double value) {
        return value;
    }

    @Override
    public Object echoAny(Object value) {
        return value;
    }

    @Override
    public double echoRange(Object[][] cells, double value) {
        int touched = 0;
        for (Object[] row : cells) {
            for (Object cell : row) {
                if (cell != null) {
                    touched++;
                }
            }
        }
        // the sum keeps the loop from being optimised away; it is zero for any range Calc passes
        return value + (touched < 0 ? 1 : 0);
    }

    @Override
    public double echoWithDocument(XPropertySet document, double value) {
        return value;
    }

    @Override
    public Object echoDensityArguments(Object[][] card, Object[][] moleFraction, Object[][] temperature,
            Object extrapolate) {
        return temperature[0][0];
    }

    @Override
    public Object echoDensityBlock(Object[][] card, Object[][] moleFraction, Object[][] temperature,
            Object extrapolate) {
        Object[][] out = new Object[temperature.length][1];
        for (int r = 0; r < out.length; r++) {
            out[r][0] = temperature[r][0];
        }
        return new Any(new Type(Object[][].class), out);
    }

    @Override
    public Object makeColumn(double rows) {
        Object[][] out = new Object[(int) rows][1];
        for (Object[] row : out) {
            row[0] = 1.0;
        }
        return new Any(new Type(Object[][].class), out);
    }

    @Override
    public double echoCellRange(XCellRange cells, double value) {
        return value;
    }

    @Override
    public double echoCellRangeAddress(XCellRange cells, double value) {
        CellRangeAddress a = UnoRuntime.queryInterface(XCellRangeAddressable.class, cells).getRangeAddress();
        return value + (a.EndRow < 0 ? 1 : 0);
    }

    @Override
    public double javaHeap(double what) {
        Runtime r = Runtime.getRuntime();
        if (what == 2) {
            // a collection first, so that one kind's garbage is not collected in the next kind's time
            System.gc();
        }
        long bytes = what == 0 ? r.totalMemory() : r.totalMemory() - r.freeMemory();
        return bytes / (1024.0 * 1024.0);
    }

    @Override
    public double countThreads(double value) {
        THREADS.add(Thread.currentThread());
        return THREADS.size();
    }

    @Override
    public double failUndeclared(double kind) {
        // a checked UNO exception thrown past the compiler, as the bridge would see an undeclared one
        BridgeProbe.<RuntimeException>sneaky(failure(kind));
        return kind;
    }

    @Override
    public double failDeclared(double kind) throws com.sun.star.lang.IllegalArgumentException,
            com.sun.star.sheet.NoConvergenceException {
        Throwable t = failure(kind);
        if (t instanceof com.sun.star.sheet.NoConvergenceException) {
            throw (com.sun.star.sheet.NoConvergenceException) t;
        }
        if (t instanceof com.sun.star.lang.IllegalArgumentException) {
            throw (com.sun.star.lang.IllegalArgumentException) t;
        }
        if (t instanceof RuntimeException) {
            throw (RuntimeException) t;
        }
        return kind;
    }

    @Override
    public String describeString(String value) {
        return "text '" + value + "'";
    }

    @Override
    public String describeDouble(double value) {
        return "number " + value;
    }

    @Override
    public String describeCells(Object[][] cells) {
        StringBuilder b = new StringBuilder();
        b.append(cells.length).append('x').append(cells.length == 0 ? 0 : cells[0].length);
        for (Object[] row : cells) {
            for (Object cell : row) {
                b.append(' ').append(describe(cell));
            }
        }
        return b.toString();
    }

    @Override
    public String describeAny(Object value) {
        Object v = value instanceof Any ? ((Any) value).getObject() : value;
        if (v instanceof Object[][]) {
            return "range " + describeCells((Object[][]) v);
        }
        return describe(value);
    }

    /** One value as the bridge delivered it: its Java type and value. */
    private static String describe(Object value) {
        Object v = value instanceof Any ? ((Any) value).getObject() : value;
        if (v == null || com.sun.star.uno.AnyConverter.isVoid(v)) {
            return "void";
        }
        if (v instanceof String) {
            return "text '" + v + "'";
        }
        if (v instanceof Double) {
            return "number " + v;
        }
        if (v instanceof Boolean) {
            return "boolean " + v;
        }
        return v.getClass().getSimpleName() + " " + v;
    }

    /** The exception a kind names (see XBridgeProbe.idl), or null. */
    private static Throwable failure(double kind) {
        switch ((int) kind) {
            case 1:
                return new com.sun.star.sheet.NoConvergenceException("probe: no convergence");
            case 2:
                return new com.sun.star.lang.IllegalArgumentException("probe: illegal argument");
            case 3:
                return new IllegalStateException("probe: a Java runtime exception");
            case 4:
                return new com.sun.star.uno.RuntimeException("probe: a UNO runtime exception");
            case 5:
                return new OwnRuntimeException("probe: a subclass of the UNO runtime exception, no UNO type");
            default:
                return null;
        }
    }

    /** A Java subclass of the UNO RuntimeException that no type library knows, as the add-in's UnexpectedFailure. */
    private static final class OwnRuntimeException extends com.sun.star.uno.RuntimeException {
        private static final long serialVersionUID = 1L;

        OwnRuntimeException(String message) {
            super(message);
        }
    }

    @SuppressWarnings("unchecked")
    private static <T extends Throwable> void sneaky(Throwable t) throws T {
        if (t != null) {
            throw (T) t;
        }
    }
}
