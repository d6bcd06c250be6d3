package org.holdover.testing;

import java.lang.reflect.Array;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Collection;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;

/**
 * Every leaf value of an object graph by its path, such as {@code chosen.bank.strings} or
 * {@code input.loads.hourlyW[4711]}: records by their components, other classes of ours by their fields,
 * lists, maps (in key order) and arrays by index; numbers, text, booleans, enums and JDK values (by
 * their text) are leaves. Functions are skipped (they hold no numbers of their own), and an object met
 * again on its own path is marked, not followed. Used to compare two runs value by value.
 */
public final class Leaves {

    private final Map<String, Object> leaves = new LinkedHashMap<>();
    private final Set<Object> onPath = java.util.Collections.newSetFromMap(new IdentityHashMap<>());

    private Leaves() {
    }

    /** The leaves of {@code root}, in a stable order. */
    public static Map<String, Object> of(Object root) {
        Leaves l = new Leaves();
        l.walk("", root);
        return l.leaves;
    }

    /** How many of the leaves are numbers (elements of numeric arrays included). */
    public static long numbers(Map<String, Object> leaves) {
        return leaves.values().stream().filter(v -> v instanceof Number).count();
    }

    private void walk(String path, Object value) {
        if (value == null) {
            leaves.put(path, "null");
            return;
        }
        Class<?> c = value.getClass();
        if (value instanceof Number || value instanceof Boolean || value instanceof Character || value instanceof String) {
            leaves.put(path, value);
            return;
        }
        if (value instanceof Enum<?> e) {
            leaves.put(path, e.getDeclaringClass().getSimpleName() + "." + e.name());
            return;
        }
        if (value instanceof java.util.function.Function<?, ?> || c.isSynthetic() || c.getName().contains("$$Lambda")) {
            leaves.put(path, "(function)");
            return;
        }
        if (c.isArray()) {
            int n = Array.getLength(value);
            leaves.put(path + ".length", n);
            for (int i = 0; i < n; i++) {
                walk(path + "[" + i + "]", Array.get(value, i));
            }
            return;
        }
        if (!onPath.add(value)) {
            leaves.put(path, "(cycle)");
            return;
        }
        try {
            if (value instanceof Optional<?> o) {
                walk(path + ".value", o.orElse(null));
            } else if (value instanceof Map<?, ?> m) {
                Map<String, Object> sorted = new TreeMap<>();
                m.forEach((k, v) -> sorted.put(String.valueOf(k), v));
                leaves.put(path + ".size", m.size());
                sorted.forEach((k, v) -> walk(path + "{" + k + "}", v));
            } else if (value instanceof Collection<?> col) {
                List<Object> items = new ArrayList<>(col);
                leaves.put(path + ".size", items.size());
                for (int i = 0; i < items.size(); i++) {
                    walk(path + "[" + i + "]", items.get(i));
                }
            } else if (c.isRecord()) {
                for (RecordComponent rc : c.getRecordComponents()) {
                    rc.getAccessor().setAccessible(true);
                    walk(join(path, rc.getName()), rc.getAccessor().invoke(value));
                }
            } else if (c.getName().startsWith("org.holdover.")) {
                for (Class<?> k = c; k != null && k != Object.class; k = k.getSuperclass()) {
                    for (Field f : k.getDeclaredFields()) {
                        if (Modifier.isStatic(f.getModifiers())) {
                            continue;
                        }
                        f.setAccessible(true);
                        walk(join(path, f.getName()), f.get(value));
                    }
                }
            } else {
                leaves.put(path, c.getSimpleName() + ":" + value);
            }
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot read " + path + " of " + c, e);
        } finally {
            onPath.remove(value);
        }
    }

    private static String join(String path, String name) {
        return path.isEmpty() ? name : path + "." + name;
    }
}
