package io.geotick.transforms.frames;

/** A frame name that the registry does not know; the message lists the known names. */
public class UnknownFrameException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public UnknownFrameException(String message) {
        super(message);
    }
}
