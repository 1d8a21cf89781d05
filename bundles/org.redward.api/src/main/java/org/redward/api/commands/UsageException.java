package org.redward.api.commands;

/**
 * Bad command-line usage: an unknown option, a missing or malformed value. The platform prints
 * the message in one line (no stack trace) and exits with status 2.
 */
public class UsageException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public UsageException(String message) {
        super(message);
    }
}
