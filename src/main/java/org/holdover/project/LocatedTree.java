package org.holdover.project;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.util.HashMap;
import java.util.Map;
import org.yaml.snakeyaml.LoaderOptions;

/**
 * A YAML or JSON document read into a Jackson tree, remembering where every key and value starts so that
 * problems can name file, line and column. Paths look like {@code loads.appliances[3].watts}.
 */
final class LocatedTree {

    private static final int MAX_NESTING = 64;
    private static final int MAX_ALIASES = 20;
    private static final String ALIAS = "a YAML alias (*";

    final JsonNode root;
    private final Map<String, SourceLocation> locations;
    private final String file;

    private LocatedTree(JsonNode root, Map<String, SourceLocation> locations, String file) {
        this.root = root;
        this.locations = locations;
        this.file = file;
    }

    /** Where the value at {@code path} starts; falls back to the nearest enclosing node, then the file. */
    SourceLocation at(String path) {
        String p = path;
        while (true) {
            SourceLocation loc = locations.get(p);
            if (loc != null) {
                return loc;
            }
            if (p.isEmpty()) {
                return SourceLocation.of(file);
            }
            int dot = Math.max(p.lastIndexOf('.'), p.lastIndexOf('['));
            p = dot < 0 ? "" : p.substring(0, dot);
        }
    }

    /** Where the key of the field at {@code path} starts (for unknown keys), or the value's location. */
    SourceLocation keyAt(String path) {
        SourceLocation loc = locations.get(path + "#key");
        return loc != null ? loc : at(path);
    }

    static LocatedTree parse(String text, String file, boolean json) throws InputException {
        JsonFactory factory;
        if (json) {
            factory = JsonFactory.builder()
                    .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                    .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_NESTING).build())
                    .build();
        } else {
            LoaderOptions options = new LoaderOptions();
            options.setMaxAliasesForCollections(MAX_ALIASES);
            options.setAllowDuplicateKeys(false);
            options.setNestingDepthLimit(MAX_NESTING);
            factory = YAMLFactory.builder()
                    .loaderOptions(options)
                    .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                    .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_NESTING).build())
                    .build();
        }
        Map<String, SourceLocation> locations = new HashMap<>();
        try (JsonParser parser = factory.createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                throw InputException.at(SourceLocation.of(file), "", "the file is empty",
                        "expected a project with at least name, mode, site and loads");
            }
            JsonNode root;
            try {
                root = readValue(parser, "", locations, file);
            } catch (StreamConstraintsException e) {
                throw InputException.at(loc(parser.currentLocation(), file), "", "nested deeper than " + MAX_NESTING
                        + " levels", "check the brackets and indentation");
            }
            JsonToken extra = parser.nextToken();
            if (extra != null) {
                throw InputException.at(loc(parser.currentTokenLocation(), file), "",
                        "more than one document in the file", "expected a single project");
            }
            return new LocatedTree(root, locations, file);
        } catch (JsonParseException e) {
            String original = String.valueOf(e.getOriginalMessage());
            if (original.startsWith(ALIAS)) {
                throw InputException.at(loc(e.getLocation(), file), "", original, "write the value out in full");
            }
            if (original.startsWith("Malformed numeric value")) {
                throw InputException.at(loc(e.getLocation(), file), "", firstLine(original).replace("Malformed numeric value",
                        "not a plain finite number:"), "write a plain number such as 120 or 0.75");
            }
            throw InputException.at(loc(e.getLocation(), file), "", "not valid " + (json ? "JSON" : "YAML")
                    + ": " + firstLine(e.getOriginalMessage()), "check indentation, colons and quotes");
        } catch (IOException | RuntimeException e) {
            // SnakeYAML reports its own errors as runtime exceptions (with a mark) wrapped by Jackson.
            throw InputException.at(SourceLocation.of(file), "", "not valid " + (json ? "JSON" : "YAML")
                    + ": " + firstLine(String.valueOf(e.getMessage())), "check indentation, colons and quotes");
        }
    }

    private static JsonNode readValue(JsonParser p, String path, Map<String, SourceLocation> locations, String file)
            throws IOException {
        JsonToken t = p.currentToken();
        locations.put(path, loc(p.currentTokenLocation(), file));
        if (p instanceof YAMLParser y && y.isCurrentAlias()) {
            // The YAML reader gives an alias as its anchor's name; say so rather than report a wrong type.
            throw new JsonParseException(p, ALIAS + p.getText() + ") is not supported");
        }
        JsonNodeFactory nf = JsonNodeFactory.instance;
        switch (t) {
            case START_OBJECT: {
                ObjectNode obj = nf.objectNode();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String key = p.currentName();
                    String child = path.isEmpty() ? key : path + "." + key;
                    locations.put(child + "#key", loc(p.currentTokenLocation(), file));
                    p.nextToken();
                    obj.set(key, readValue(p, child, locations, file));
                }
                return obj;
            }
            case START_ARRAY: {
                ArrayNode arr = nf.arrayNode();
                int i = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    arr.add(readValue(p, path + "[" + i + "]", locations, file));
                    i++;
                }
                return arr;
            }
            case VALUE_STRING:
                return nf.textNode(p.getText());
            case VALUE_NUMBER_INT:
                return p.getNumberType() == JsonParser.NumberType.BIG_INTEGER
                        ? nf.numberNode(p.getDoubleValue()) : nf.numberNode(p.getLongValue());
            case VALUE_NUMBER_FLOAT:
                return nf.numberNode(p.getDoubleValue());
            case VALUE_TRUE:
                return nf.booleanNode(true);
            case VALUE_FALSE:
                return nf.booleanNode(false);
            case VALUE_NULL:
                return nf.nullNode();
            default:
                return nf.textNode(p.getText());
        }
    }

    static SourceLocation loc(JsonLocation l, String file) {
        if (l == null) {
            return SourceLocation.of(file);
        }
        return new SourceLocation(file, Math.max(0, l.getLineNr()), Math.max(0, l.getColumnNr()));
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "unreadable";
        }
        String line = s.strip();
        int nl = line.indexOf('\n');
        return nl < 0 ? line : line.substring(0, nl).strip();
    }
}
