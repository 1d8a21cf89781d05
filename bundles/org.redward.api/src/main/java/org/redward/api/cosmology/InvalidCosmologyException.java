package org.redward.api.cosmology;

/**
 * A parameter or an argument that makes no physical sense (negative density, no big bang, a
 * negative or NaN redshift, a redshift above {@link Cosmology#MAX_REDSHIFT}). The message names
 * the parameter at fault; {@link #parameter()} gives it alone.
 */
public class InvalidCosmologyException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;
    private final String parameter;

    public InvalidCosmologyException(String parameter, String message) {
        super(message.startsWith(parameter) ? message : parameter + ": " + message);
        this.parameter = parameter;
    }

    /** The name of the parameter at fault, as the command line spells it (e.g. {@code omega_m}, {@code z}). */
    public String parameter() {
        return parameter;
    }
}
