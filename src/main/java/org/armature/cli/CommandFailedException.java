package org.armature.cli;

/**
 * A command could not do its work (a file could not be written, a solve failed). The message is one
 * sentence for the user; the command line prints it on the error stream and exits with status 1.
 * Usage errors are {@link picocli.CommandLine.ParameterException}s instead (status 2).
 */
public final class CommandFailedException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** @param message one sentence for the user */
    public CommandFailedException(String message) {
        super(message);
    }

    /**
     * @param message one sentence for the user
     * @param cause the underlying failure, kept for diagnosis
     */
    public CommandFailedException(String message, Throwable cause) {
        super(message, cause);
    }
}
