package org.miscela.calc;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.sheet.NoConvergenceException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.MaxCountExceededException;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The adapter's one mapping point from what a call throws to what Calc shows. Each method of {@link MixtureAddIn}
 * has one {@code catch (RuntimeException ex)} that hands the exception here, with its own IDL name; nothing is
 * allocated on the way of a call that succeeds. The mapping (platform facts measured by UnoExceptionCodesIT):
 *
 * <ul>
 *   <li>a refusal, a {@link MiscelaException}, becomes com.sun.star.lang.IllegalArgumentException with its message:
 *       Calc shows Err:502;</li>
 *   <li>a numerical search that did not converge, {@link Problem#NO_CONVERGENCE} (or a Commons Math
 *       MaxCountExceededException / ConvergenceException that escaped the core, with the same words), becomes
 *       com.sun.star.sheet.NoConvergenceException: Calc shows Err:523. The IDL does not declare it; the bridge passes
 *       it on all the same, and the saved formulas do not change;</li>
 *   <li>anything else is a fault, never a refusal: {@link UnexpectedFailure} (a UNO RuntimeException), which Calc
 *       shows as #VALUE!, with the words of {@link Problem#UNEXPECTED_FAILURE} (the function, the exception's class
 *       and message, the top frames down to the add-in's method). MIX.EXPLAIN of the same call answers with them, and the last one since the
 *       office started is kept, with its time, for MIX.INFO("last failure"); nothing is written anywhere.</li>
 * </ul>
 */
final class Failures {
    /** What MIX.INFO("last failure") answers before any failure. */
    static final String NONE = "No unexpected failure since the office started.";
    /** The longest exception message quoted, in characters; the whole record is bounded by {@link #RECORD_LIMIT}. */
    private static final int MESSAGE_LIMIT = 300;
    private static final int FRAMES = 4;
    private static final int RECORD_LIMIT = 1000;

    /** The last unexpected failure with its time, or null: one immutable string, replaced as a whole. */
    private static volatile String last;

    private Failures() {
    }

    /**
     * For a method that refuses: the IllegalArgumentException to throw for a refusal. What is not a refusal it throws
     * itself: NoConvergenceException for a search that did not converge, {@link UnexpectedFailure} for a fault.
     */
    static IllegalArgumentException refusal(RuntimeException ex, String method) {
        MiscelaException refused = refused(ex, method);
        if (refused.problem() == Problem.NO_CONVERGENCE) {
            throw Failures.<RuntimeException>undeclared(new NoConvergenceException(refused.getMessage()));
        }
        return new IllegalArgumentException(refused.getMessage());
    }

    /**
     * For a method that answers in words (MIX.CHECK, MIX.CHECKPOINT, MIX.EXPLAIN, a fit's "check"): the refusal's
     * message. A fault it throws as {@link UnexpectedFailure}, as {@link #refusal} does.
     */
    static String words(RuntimeException ex, String method) {
        return refused(ex, method).getMessage();
    }

    /** The last unexpected failure since the office started, with its time (UTC), or {@link #NONE}. */
    static String last() {
        String l = last;
        return l == null ? NONE : l;
    }

    /** The refusal an exception stands for; throws an {@link UnexpectedFailure} when it stands for none. */
    private static MiscelaException refused(RuntimeException ex, String method) {
        if (ex instanceof MiscelaException) {
            return (MiscelaException) ex;
        }
        if (ex instanceof MaxCountExceededException || ex instanceof ConvergenceException) {
            // a Commons Math search the core did not guard: it did not converge, which is no fault of the data
            return Problem.NO_CONVERGENCE.raise("the result of " + displayName(method),
                    ex.getClass().getSimpleName() + ": " + cut(ex.getMessage()));
        }
        if (ex instanceof UnexpectedFailure) {
            throw (UnexpectedFailure) ex;
        }
        throw unexpected(ex, method);
    }

    /** The fault as Calc gets it (#VALUE!), its words kept as the last failure. */
    private static UnexpectedFailure unexpected(RuntimeException ex, String method) {
        StringBuilder where = new StringBuilder(ex.getClass().getName());
        if (ex.getMessage() != null) {
            where.append(": ").append(cut(ex.getMessage()));
        }
        StackTraceElement[] frames = ex.getStackTrace();
        for (int i = 0; i < Math.min(FRAMES, frames.length); i++) {
            where.append(i == 0 ? " at " : " < ").append(frames[i]);
            if (frames[i].getClassName().equals(MixtureAddIn.class.getName())) {
                // the add-in's method itself; what called it (the bridge, or MIX.EXPLAIN) says nothing more
                break;
            }
        }
        if (frames.length == 0) {
            where.append(" (no stack trace)");
        }
        String words = Problem.UNEXPECTED_FAILURE.format(displayName(method), where);
        if (words.length() > RECORD_LIMIT) {
            words = words.substring(0, RECORD_LIMIT - 1) + "…";
        }
        last = Instant.now().truncatedTo(ChronoUnit.SECONDS) + " " + words;
        return new UnexpectedFailure(words, ex);
    }

    /** The name a person knows a method by (MIX.DENSITY for mixtureDensity). */
    private static String displayName(String method) {
        try {
            return FunctionCatalog.byMethod(method).displayName();
        } catch (IllegalArgumentException notAMethod) {
            // a wrong name must not hide the failure being reported (FailuresTest keeps the names right)
            return method;
        }
    }

    private static String cut(String message) {
        if (message == null) {
            return "no message";
        }
        return message.length() <= MESSAGE_LIMIT ? message : message.substring(0, MESSAGE_LIMIT) + "…";
    }

    /** Throws a checked exception the method does not declare (the UNO bridge passes it on to Calc). */
    @SuppressWarnings("unchecked")
    private static <T extends Throwable> T undeclared(Throwable t) throws T {
        throw (T) t;
    }
}
