package org.chillwright.account;

/** The password rule every form and API request states the same way. */
public final class Passwords {

    public static final int MIN_LENGTH = 12;
    public static final int MAX_LENGTH = 128;
    /** Says what is wrong and never what was typed. */
    public static final String LENGTH_MESSAGE = "must be 12 to 128 characters long";

    private Passwords() {
    }
}
