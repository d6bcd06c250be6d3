package org.holdover.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;

/** Where test support writes its files: {@code <module>/target/holdover-testing/}. */
public final class Artifacts {

    private static final AtomicInteger RUN_COUNTER = new AtomicInteger();

    private Artifacts() {
    }

    /**
     * The root folder for test artifacts. Maven's Surefire sets {@code basedir}; outside Maven the
     * working directory is taken as the module folder.
     *
     * @return {@code <basedir>/target/holdover-testing}, created if needed
     */
    public static Path root() {
        String base = System.getProperty("basedir", System.getProperty("user.dir"));
        return createDirectories(Path.of(base).toAbsolutePath().resolve("target").resolve("holdover-testing"));
    }

    /**
     * A named folder under {@link #root()}, for example for workbooks a test builds.
     *
     * @param name folder name, a single path element
     * @return the folder, created if needed
     */
    public static Path dir(String name) {
        Path dir = root().resolve(name).normalize();
        if (!dir.getParent().equals(root())) {
            throw new IllegalArgumentException("folder name must be a single path element, got " + name);
        }
        return createDirectories(dir);
    }

    /**
     * A new, empty folder for one run of an external program: {@code <root>/<kind>-<pid>-<n>}.
     *
     * @param kind a short word for what runs there, for example {@code recalc} or {@code pdf}
     * @return the new folder
     */
    static Path newRunDir(String kind) {
        Path root = root();
        while (true) {
            Path dir = root.resolve(kind + "-" + ProcessHandle.current().pid() + "-" + RUN_COUNTER.incrementAndGet());
            if (!Files.exists(dir)) {
                return createDirectories(dir);
            }
        }
    }

    static Path createDirectories(Path dir) {
        try {
            return Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create folder " + dir, e);
        }
    }
}
