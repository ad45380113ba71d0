package io.geotick.transforms;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;

/**
 * Why a file could not be read or written, in words for a message that already names the file: the
 * exceptions of {@code java.nio.file} carry only the path as their message, so "cannot read x.gsb: x.gsb"
 * becomes "cannot read x.gsb: no such file or directory".
 */
public final class FileFailure {
    private FileFailure() {
    }

    /** The reason for {@code e}, without the file name. */
    public static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or directory";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }
}
