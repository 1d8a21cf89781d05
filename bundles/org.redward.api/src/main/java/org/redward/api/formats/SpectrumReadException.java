package org.redward.api.formats;

import java.nio.file.Path;

/**
 * A file (or one of its parts) cannot be read. The message names the file and, where they
 * apply, the HDU and column at fault, in words a user can act on.
 */
public class SpectrumReadException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient Path file;

    public SpectrumReadException(Path file, String message) {
        super(file + ": " + message);
        this.file = file;
    }

    public SpectrumReadException(Path file, String message, Throwable cause) {
        super(file + ": " + message, cause);
        this.file = file;
    }

    public Path file() {
        return file;
    }
}
