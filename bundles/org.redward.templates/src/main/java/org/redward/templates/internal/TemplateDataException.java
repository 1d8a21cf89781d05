package org.redward.templates.internal;

/** Bad template data or descriptor: the message names the bundle or file and what is wrong. */
public final class TemplateDataException extends Exception {

    private static final long serialVersionUID = 1L;

    public TemplateDataException(String message) {
        super(message);
    }

    public TemplateDataException(String message, Throwable cause) {
        super(message, cause);
    }
}
