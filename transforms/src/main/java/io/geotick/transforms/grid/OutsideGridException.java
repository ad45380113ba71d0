package io.geotick.transforms.grid;

import io.geotick.geodesy.InvalidCoordinateException;

/**
 * A point lies outside the area a grid covers (or on nodes without data). Never a silent pass-through:
 * the message names the point and the grid's extent.
 */
public class OutsideGridException extends InvalidCoordinateException {
    private static final long serialVersionUID = 1L;

    public OutsideGridException(String message) {
        super(message);
    }
}
