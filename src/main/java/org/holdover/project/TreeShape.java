package org.holdover.project;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Checks the shape of a parsed tree against a record type before binding: unknown keys (with a
 * "did you mean" hint), wrong types, non-finite numbers and unknown enum words. Every problem is
 * collected. Where the user's spelling is unambiguous the tree is normalised in place (enum words such
 * as {@code off-grid} become {@code OFF_GRID}, a single string becomes a one-element list), so that
 * Jackson's binding afterwards cannot fail.
 */
final class TreeShape {

    private final LocatedTree tree;
    private final List<Problem> problems = new ArrayList<>();

    private TreeShape(LocatedTree tree) {
        this.tree = tree;
    }

    static List<Problem> check(LocatedTree tree, Class<?> rootType) {
        TreeShape s = new TreeShape(tree);
        JsonNode normalised = s.walk(tree.root, rootType, "");
        if (normalised != tree.root) {
            throw new IllegalStateException("the root cannot be replaced");
        }
        return s.problems;
    }

    private JsonNode walk(JsonNode node, Type type, String path) {
        if (node == null || node.isNull()) {
            return node;
        }
        Class<?> raw = rawClass(type);
        if (raw.isRecord()) {
            if (!node.isObject()) {
                problem(path, "expected a mapping of fields, got " + describe(node),
                        "fields: " + fieldNames(raw));
                return node;
            }
            ObjectNode obj = (ObjectNode) node;
            Map<String, RecordComponent> components = Arrays.stream(raw.getRecordComponents())
                    .collect(Collectors.toMap(RecordComponent::getName, c -> c));
            Iterator<Map.Entry<String, JsonNode>> it = obj.fields();
            List<Map.Entry<String, JsonNode>> replacements = new ArrayList<>();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                String child = path.isEmpty() ? e.getKey() : path + "." + e.getKey();
                RecordComponent c = components.get(e.getKey());
                if (c == null) {
                    problems.add(new Problem(tree.keyAt(child), child, "unknown field \"" + e.getKey() + "\"",
                            hint(e.getKey(), components.keySet())));
                    continue;
                }
                JsonNode replaced = walk(e.getValue(), c.getGenericType(), child);
                if (replaced != e.getValue()) {
                    replacements.add(Map.entry(e.getKey(), replaced));
                }
            }
            for (Map.Entry<String, JsonNode> r : replacements) {
                obj.set(r.getKey(), r.getValue());
            }
            for (String unknown : unknownKeys(obj, components.keySet())) {
                obj.remove(unknown);
            }
            return obj;
        }
        if (List.class.isAssignableFrom(raw)) {
            Type element = ((ParameterizedType) type).getActualTypeArguments()[0];
            if (!node.isArray()) {
                if (node.isValueNode() && !rawClass(element).isRecord()) {
                    ArrayNode wrapped = JsonNodeFactory.instance.arrayNode();
                    wrapped.add(walk(node, element, path));
                    return wrapped;
                }
                problem(path, "expected a list, got " + describe(node), "write it as a list: [a, b] or one \"- item\" per line");
                return node;
            }
            ArrayNode arr = (ArrayNode) node;
            for (int i = 0; i < arr.size(); i++) {
                JsonNode replaced = walk(arr.get(i), element, path + "[" + i + "]");
                if (replaced != arr.get(i)) {
                    arr.set(i, replaced);
                }
            }
            return arr;
        }
        if (raw.isEnum()) {
            if (!node.isTextual()) {
                problem(path, "expected one of " + enumWords(raw) + ", got " + describe(node), "");
                return node;
            }
            String canonical = canonicalEnum(node.asText(), raw);
            if (canonical == null) {
                problem(path, "unknown value \"" + node.asText() + "\"", "expected one of " + enumWords(raw));
                return node;
            }
            return JsonNodeFactory.instance.textNode(canonical);
        }
        if (raw == Double.class || raw == double.class) {
            if (!node.isNumber()) {
                problem(path, "expected a number, got " + describe(node), "write a plain number without units");
                return node;
            }
            if (!Double.isFinite(node.doubleValue())) {
                problem(path, "must be a finite number, got " + node.asText(), "write a plain number");
            }
            return node;
        }
        if (raw == Integer.class || raw == int.class) {
            if (!node.isNumber() || node.doubleValue() != Math.rint(node.doubleValue())
                    || Math.abs(node.doubleValue()) > Integer.MAX_VALUE) {
                problem(path, "expected a whole number, got " + describe(node), "");
                return node;
            }
            return JsonNodeFactory.instance.numberNode(node.intValue());
        }
        if (raw == Boolean.class || raw == boolean.class) {
            if (!node.isBoolean()) {
                problem(path, "expected true or false, got " + describe(node), "");
            }
            return node;
        }
        if (raw == String.class) {
            if (node.isTextual()) {
                return node;
            }
            if (node.isValueNode()) {
                return JsonNodeFactory.instance.textNode(node.asText());
            }
            problem(path, "expected text, got " + describe(node), "");
            return node;
        }
        throw new IllegalStateException("no shape rule for " + type + " at " + path);
    }

    private static List<String> unknownKeys(ObjectNode obj, java.util.Set<String> known) {
        List<String> out = new ArrayList<>();
        obj.fieldNames().forEachRemaining(k -> {
            if (!known.contains(k)) {
                out.add(k);
            }
        });
        return out;
    }

    private void problem(String path, String message, String expected) {
        problems.add(new Problem(tree.at(path), path, message, expected));
    }

    static String canonicalEnum(String text, Class<?> enumType) {
        String key = squash(text);
        for (Object c : enumType.getEnumConstants()) {
            if (squash(((Enum<?>) c).name()).equals(key)) {
                return ((Enum<?>) c).name();
            }
        }
        return null;
    }

    private static String squash(String s) {
        return s.toLowerCase(Locale.ROOT).replace("-", "").replace("_", "").replace(" ", "").replace("/", "");
    }

    static String enumWords(Class<?> enumType) {
        return Arrays.stream(enumType.getEnumConstants())
                .map(c -> ((Enum<?>) c).name().toLowerCase(Locale.ROOT).replace('_', '-'))
                .collect(Collectors.joining(", "));
    }

    private static String fieldNames(Class<?> recordType) {
        return Arrays.stream(recordType.getRecordComponents()).map(RecordComponent::getName)
                .collect(Collectors.joining(", "));
    }

    private static String describe(JsonNode node) {
        if (node.isObject()) {
            return "a mapping";
        }
        if (node.isArray()) {
            return "a list";
        }
        if (node.isTextual()) {
            String t = node.asText();
            return "\"" + (t.length() > 40 ? t.substring(0, 40) + "…" : t) + "\"";
        }
        return node.asText();
    }

    /** A "did you mean" hint for an unknown key, or the list of accepted keys. */
    static String hint(String key, java.util.Collection<String> known) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = editDistance(key.toLowerCase(Locale.ROOT), k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = k;
            }
        }
        int allowed = Math.max(2, key.length() / 3);
        if (best != null && bestDistance <= allowed) {
            return "did you mean \"" + best + "\"?";
        }
        return "expected one of: " + known.stream().sorted().collect(Collectors.joining(", "));
    }

    static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    private static Class<?> rawClass(Type type) {
        if (type instanceof Class<?> c) {
            return c;
        }
        if (type instanceof ParameterizedType p) {
            return (Class<?>) p.getRawType();
        }
        throw new IllegalStateException("unsupported type " + type);
    }
}
