package org.miscela.calc;

/**
 * A fault inside the add-in, never a refusal: what {@link Failures} throws for any exception that is not a catalogued
 * problem. A UNO RuntimeException, so Calc shows #VALUE!; its message is the words of the catalogue's
 * UNEXPECTED_FAILURE, and its cause the exception itself.
 */
final class UnexpectedFailure extends com.sun.star.uno.RuntimeException {
    private static final long serialVersionUID = 1L;

    UnexpectedFailure(String words, Throwable cause) {
        super(cause, words);
    }
}
