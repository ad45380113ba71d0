package io.geotick.transforms.frames;

/**
 * No chain of parameter sets in the registry connects the two frames (at the coordinate epoch given,
 * for links valid only over a date range). The message names both frames and the epoch.
 */
public class NoFramePathException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public NoFramePathException(String message) {
        super(message);
    }
}
