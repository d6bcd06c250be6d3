package org.holdover.project;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads a project file (YAML, or JSON when the name ends in {@code .json}) into a validated {@link Project}.
 * All problems are collected and thrown together as one {@link InputException}.
 */
public final class ProjectReader {

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .build();

    private ProjectReader() {
    }

    /**
     * @param file    the project file
     * @param display how to name it in messages (usually the path as typed)
     */
    public static Project read(Path file, String display) throws InputException {
        String text = InputFiles.readText(file, display, InputFiles.MAX_PROJECT_BYTES);
        boolean json = file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json");
        return parse(text, file, display, json);
    }

    /** Parses project text already in memory (for tests and stdin). */
    public static Project parse(String text, Path file, String display, boolean json) throws InputException {
        LocatedTree tree = LocatedTree.parse(text, display, json);
        if (!tree.root.isObject()) {
            throw InputException.at(tree.at(""), "", "expected a project (a mapping of fields), got "
                    + (tree.root.isArray() ? "a list" : "\"" + tree.root.asText() + "\""),
                    "start with name:, mode:, site: and loads:");
        }
        List<Problem> problems = new ArrayList<>(TreeShape.check(tree, ProjectInput.class));
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        ProjectInput input;
        try {
            input = MAPPER.treeToValue(tree.root, ProjectInput.class);
        } catch (Exception e) {
            throw new IllegalStateException("binding after a clean shape check failed", e);
        }
        Project unchecked = new Project(input, file, display, tree::at, List.of());
        ProjectValidator.Result result = ProjectValidator.validate(unchecked);
        if (!result.errors().isEmpty()) {
            throw new InputException(result.errors());
        }
        return new Project(input, file, display, tree::at, result.warnings());
    }
}
