package org.holdover.testing;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.util.function.UnaryOperator;

/**
 * A stream that passes the first {@code limit} bytes through and then fails, as a full disk or a pulled
 * drive would: with an {@link IOException}, or with a runtime exception for code that must clean up after
 * anything. Closing it closes the stream underneath.
 */
public final class FailingOutputStream extends FilterOutputStream {

    /** The message of the failure, so a test can tell it from others. */
    public static final String MESSAGE = "injected failure: no space left on device";

    private final long limit;
    private final boolean unchecked;
    private long written;

    private FailingOutputStream(OutputStream out, long limit, boolean unchecked) {
        super(out);
        this.limit = limit;
        this.unchecked = unchecked;
    }

    /**
     * @param limit     bytes that get through before the failure
     * @param unchecked fail with an {@link UncheckedIOException} instead of an {@link IOException}
     * @return a wrapper for a writer's seam
     */
    public static UnaryOperator<OutputStream> after(long limit, boolean unchecked) {
        return out -> new FailingOutputStream(out, limit, unchecked);
    }

    @Override
    public void write(int b) throws IOException {
        check(1);
        out.write(b);
        written++;
    }

    @Override
    public void write(byte[] b, int off, int len) throws IOException {
        long room = limit - written;
        if (len > room) {
            out.write(b, off, (int) Math.max(0, room));
            written += Math.max(0, room);
        }
        check(len);
        out.write(b, off, len);
        written += len;
    }

    private void check(long more) throws IOException {
        if (written + more > limit) {
            IOException e = new IOException(MESSAGE);
            if (unchecked) {
                throw new UncheckedIOException(e);
            }
            throw e;
        }
    }

    /** Bytes that got through. */
    public long written() {
        return written;
    }
}
