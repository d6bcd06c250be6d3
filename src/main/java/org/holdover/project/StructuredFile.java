package org.holdover.project;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;

/**
 * Reads a YAML or JSON file into a record type with the project file's rules: strict UTF-8, a size
 * limit, unknown keys and wrong types reported with file, line and column and a hint. Used for catalogs;
 * the project file goes through {@link ProjectReader}, which adds its own value checks.
 */
public final class StructuredFile {

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .build();

    private StructuredFile() {
    }

    /**
     * A file read into a record.
     *
     * @param value   the record
     * @param locator field path → where it is written
     */
    public record Parsed<T>(T value, Function<String, SourceLocation> locator) {
    }

    /** Reads a file of at most {@link InputFiles#MAX_PROJECT_BYTES}. */
    public static <T> Parsed<T> read(Path file, String display, Class<T> type) throws InputException {
        String text = InputFiles.readText(file, display, InputFiles.MAX_PROJECT_BYTES);
        boolean json = file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json");
        return parse(text, display, json, type);
    }

    /** Parses text already in memory. */
    public static <T> Parsed<T> parse(String text, String display, boolean json, Class<T> type) throws InputException {
        LocatedTree tree = LocatedTree.parse(text, display, json);
        if (!tree.root.isObject()) {
            throw InputException.at(tree.at(""), "", "expected a mapping of fields at the top of the file", "");
        }
        List<Problem> problems = TreeShape.check(tree, type);
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        try {
            return new Parsed<>(MAPPER.treeToValue(tree.root, type), tree::at);
        } catch (Exception e) {
            throw new IllegalStateException("binding after a clean shape check failed", e);
        }
    }
}
