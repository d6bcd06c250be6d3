package org.holdover.project;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/**
 * Reading user files safely: a size limit checked before the file is read, strict UTF-8 (a byte-order
 * mark is allowed and dropped), and every failure turned into an {@link InputException} naming the file.
 */
public final class InputFiles {

    /** Largest project or catalog file accepted, bytes. */
    public static final long MAX_PROJECT_BYTES = 2L * 1024 * 1024;
    /** Largest load-profile or weather file accepted, bytes (a year of 1-minute readings is ~20 MB). */
    public static final long MAX_DATA_BYTES = 200L * 1024 * 1024;

    private InputFiles() {
    }

    /**
     * Reads a whole text file as strict UTF-8.
     *
     * @param file     the file
     * @param display  how to name it in messages
     * @param maxBytes size limit, bytes
     */
    public static String readText(Path file, String display, long maxBytes) throws InputException {
        checkReadable(file, display, maxBytes);
        byte[] bytes;
        try (InputStream in = Files.newInputStream(file)) {
            bytes = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, maxBytes + 1));
        } catch (IOException e) {
            throw InputException.at(SourceLocation.of(display), "", "cannot read the file: " + e.getMessage(), "");
        }
        if (bytes.length > maxBytes) {
            throw tooLarge(display, maxBytes);
        }
        return decodeUtf8(bytes, display);
    }

    /**
     * Checks that a file exists, is a regular readable file and is within the size limit. A device, pipe or
     * socket is refused: its size is not known before it is read (a device such as /dev/zero never ends).
     */
    public static void checkReadable(Path file, String display, long maxBytes) throws InputException {
        try {
            if (Files.isDirectory(file)) {
                throw InputException.at(SourceLocation.of(display), "", "is a folder, not a file", "give the path of a file");
            }
            long size = Files.size(file);
            if (!Files.isRegularFile(file)) {
                throw InputException.at(SourceLocation.of(display), "", "is not a regular file (a device, pipe or socket)",
                        "give the path of a file");
            }
            if (size > maxBytes) {
                throw tooLarge(display, maxBytes);
            }
            if (!Files.isReadable(file)) {
                throw InputException.at(SourceLocation.of(display), "", "cannot be read (permission denied)", "");
            }
        } catch (NoSuchFileException e) {
            throw InputException.at(SourceLocation.of(display), "", "no such file", "check the path");
        } catch (AccessDeniedException e) {
            throw InputException.at(SourceLocation.of(display), "", "cannot be read (permission denied)", "");
        } catch (IOException e) {
            throw InputException.at(SourceLocation.of(display), "", "cannot read the file: " + e.getMessage(), "");
        }
    }

    private static InputException tooLarge(String display, long maxBytes) {
        return InputException.at(SourceLocation.of(display), "", "the file is larger than the limit of "
                + (maxBytes / (1024 * 1024)) + " MB", "check it is the right file");
    }

    /** Strict UTF-8 decoding; the error names the line of the first bad byte. */
    public static String decodeUtf8(byte[] bytes, String display) throws InputException {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        try {
            String text = decoder.decode(ByteBuffer.wrap(bytes)).toString();
            if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
                text = text.substring(1);
            }
            if (text.indexOf('\0') >= 0) {
                int line = lineOf(bytes, indexOfZero(bytes));
                throw InputException.at(SourceLocation.of(display, line), "", "contains a NUL byte: this looks like a binary file",
                        "expected a UTF-8 text file");
            }
            return text;
        } catch (MalformedInputException e) {
            int offset = findMalformed(bytes);
            throw InputException.at(SourceLocation.of(display, lineOf(bytes, offset)), "",
                    "is not valid UTF-8 text (byte " + (offset + 1) + ")",
                    "save the file as UTF-8");
        } catch (CharacterCodingException e) {
            throw InputException.at(SourceLocation.of(display), "", "is not valid UTF-8 text", "save the file as UTF-8");
        }
    }

    private static int indexOfZero(byte[] bytes) {
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == 0) {
                return i;
            }
        }
        return 0;
    }

    private static int findMalformed(byte[] bytes) {
        CharsetDecoder d = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        java.nio.CharBuffer out = java.nio.CharBuffer.allocate(bytes.length + 1);
        d.decode(in, out, true);
        return in.position();
    }

    private static int lineOf(byte[] bytes, int offset) {
        int line = 1;
        for (int i = 0; i < offset && i < bytes.length; i++) {
            if (bytes[i] == '\n') {
                line++;
            }
        }
        return line;
    }
}
