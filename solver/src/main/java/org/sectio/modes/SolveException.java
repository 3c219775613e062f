package org.sectio.modes;

/** A solve that cannot be done as asked; the message is one line meant for the user. */
public class SolveException extends RuntimeException {

    /** @param message what went wrong, with the values, and what to do */
    public SolveException(String message) {
        super(message);
    }

    /** @param message what went wrong; @param cause the underlying failure */
    public SolveException(String message, Throwable cause) {
        super(message, cause);
    }
}
