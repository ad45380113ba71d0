package io.geotick.transforms.frames;

import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A set of frames and the parameter sets (links) between them, with path finding. Immutable and
 * thread-safe; {@link #standard()} is the built-in registry, {@link #builder()} makes another (e.g. the
 * standard one plus a user's own parameters).
 *
 * <h2>Path finding</h2>
 * The path is the one with the fewest links (breadth-first search; ties go to the link registered
 * first). Links valid only over a date range (WGS 84 ↔ ITRF) are used only when the coordinate epoch
 * falls in their range. Without an epoch, paths that need none are preferred; if every path needs one, a
 * {@link MissingEpochException} names the step that does: an epoch is never assumed.
 *
 * <h2>Names</h2>
 * Lookup ignores case, spaces, hyphens and underscores, and accepts aliases such as {@code "WGS84"},
 * {@code "OSGB36"}, {@code "EPSG:4230"}.
 */
public final class FrameRegistry {
    private final List<Frame> frames;
    private final List<FrameLink> links;
    private final Map<String, Frame> byKey;
    private final Map<Frame, List<FrameLink>> adjacency;

    private FrameRegistry(List<Frame> frames, List<FrameLink> links) {
        this.frames = List.copyOf(frames);
        this.links = List.copyOf(links);
        Map<String, Frame> m = new HashMap<>();
        if (new java.util.HashSet<>(frames).size() != frames.size()) {
            throw new IllegalArgumentException("a frame is registered twice: " + frames);
        }
        for (Frame f : frames) {
            put(m, f.name(), f);
            for (String a : f.aliases()) {
                put(m, a, f);
            }
            f.epsgCrs().ifPresent(c -> m.putIfAbsent(key("EPSG:" + c), f));
        }
        this.byKey = Collections.unmodifiableMap(m);
        Map<Frame, List<FrameLink>> adj = new LinkedHashMap<>();
        for (Frame f : frames) {
            adj.put(f, new ArrayList<>());
        }
        for (FrameLink l : links) {
            if (!adj.containsKey(l.from()) || !adj.containsKey(l.to())) {
                throw new IllegalArgumentException("link " + l + " refers to a frame not in the registry");
            }
            adj.get(l.from()).add(l);
            adj.get(l.to()).add(l);
        }
        this.adjacency = adj;
    }

    private static void put(Map<String, Frame> m, String name, Frame f) {
        Frame old = m.put(key(name), f);
        if (old != null && !old.equals(f)) {
            throw new IllegalArgumentException("frame name '" + name + "' is used by both " + old + " and " + f);
        }
    }

    private static String key(String name) {
        return name.toLowerCase(Locale.ROOT).replaceAll("[\\s_\\-]", "");
    }

    /** The built-in registry: see {@link StandardFrames} for its frames and parameter sets. */
    public static FrameRegistry standard() {
        return StandardFrames.REGISTRY;
    }

    /** A builder starting empty. */
    public static Builder builder() {
        return new Builder();
    }

    /** A builder starting with this registry's frames and links. */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.frames.addAll(frames);
        b.links.addAll(links);
        return b;
    }

    /** Every frame, in registration order. */
    public List<Frame> frames() {
        return frames;
    }

    /** Every link, in registration order. */
    public List<FrameLink> links() {
        return links;
    }

    /**
     * The frame of that name or alias.
     *
     * @throws UnknownFrameException naming the text and listing the known frames
     */
    public Frame frame(String name) {
        Frame f = name == null ? null : byKey.get(key(name));
        if (f == null) {
            StringBuilder known = new StringBuilder();
            for (Frame k : frames) {
                known.append(known.length() == 0 ? "" : ", ").append(k.name());
            }
            throw new UnknownFrameException("unknown frame '" + name + "'; known frames: " + known);
        }
        return f;
    }

    /** Whether a frame of that name or alias exists. */
    public boolean contains(String name) {
        return name != null && byKey.containsKey(key(name));
    }

    /**
     * The transformation from {@code source} to {@code target} for coordinates that need no epoch.
     *
     * @throws MissingEpochException if every path includes a time-dependent or date-aligned step
     */
    public FrameTransformation transformation(Frame source, Frame target) {
        return find(source, target, Optional.empty());
    }

    /** The transformation from {@code source} to {@code target} for coordinates at {@code epoch}. */
    public FrameTransformation transformation(Frame source, Frame target, Epoch epoch) {
        return find(source, target, Optional.of(Objects.requireNonNull(epoch, "epoch")));
    }

    /** By names; see {@link #frame(String)} and {@link #transformation(Frame, Frame, Epoch)}. */
    public FrameTransformation transformation(String source, String target, Optional<Epoch> epoch) {
        return find(frame(source), frame(target), epoch);
    }

    private FrameTransformation find(Frame source, Frame target, Optional<Epoch> epoch) {
        check(source);
        check(target);
        List<FrameLink> path;
        List<Boolean> dirs = new ArrayList<>();
        if (epoch.isPresent()) {
            path = search(source, target, l -> l.validAt(epoch.get()), dirs);
        } else {
            path = search(source, target, l -> !l.requiresEpoch(), dirs);
            if (path == null) {
                dirs.clear();
                path = search(source, target, l -> true, dirs);
            }
        }
        if (path == null) {
            throw new NoFramePathException("no chain of parameter sets joins " + source + " and " + target
                + epoch.map(e -> " for coordinates at epoch " + e).orElse("") + " in this registry");
        }
        List<FrameStep> steps = new ArrayList<>();
        for (int i = 0; i < path.size(); i++) {
            steps.add(path.get(i).resolve(dirs.get(i), epoch));
        }
        return new FrameTransformation(source, target, epoch, steps);
    }

    private void check(Frame f) {
        Objects.requireNonNull(f, "frame");
        if (!adjacency.containsKey(f)) {
            throw new UnknownFrameException("frame " + f + " is not in this registry");
        }
    }

    /** Breadth-first search; fills {@code dirs} with the direction of each link (true = forward). */
    private List<FrameLink> search(Frame s, Frame t, java.util.function.Predicate<FrameLink> usable,
            List<Boolean> dirs) {
        Map<Frame, FrameLink> via = new HashMap<>();
        Map<Frame, Frame> prev = new HashMap<>();
        ArrayDeque<Frame> queue = new ArrayDeque<>();
        queue.add(s);
        prev.put(s, s);
        while (!queue.isEmpty()) {
            Frame f = queue.poll();
            if (f.equals(t)) {
                break;
            }
            for (FrameLink l : adjacency.get(f)) {
                if (!usable.test(l)) {
                    continue;
                }
                Frame n = l.other(f);
                if (!prev.containsKey(n)) {
                    prev.put(n, f);
                    via.put(n, l);
                    queue.add(n);
                }
            }
        }
        if (!prev.containsKey(t)) {
            return null;
        }
        List<FrameLink> path = new ArrayList<>();
        for (Frame f = t; !f.equals(s); f = prev.get(f)) {
            FrameLink l = via.get(f);
            path.add(0, l);
            dirs.add(0, l.to().equals(f));
        }
        return path;
    }

    /** Collects frames and links; {@link #build()} checks names are unique and links refer to known frames. */
    public static final class Builder {
        private final List<Frame> frames = new ArrayList<>();
        private final List<FrameLink> links = new ArrayList<>();

        private Builder() {
        }

        /** Adds a frame. */
        public Builder add(Frame frame) {
            frames.add(Objects.requireNonNull(frame, "frame"));
            return this;
        }

        /** Adds a link between two frames already (or later) added. */
        public Builder add(FrameLink link) {
            links.add(Objects.requireNonNull(link, "link"));
            return this;
        }

        /** The immutable registry. */
        public FrameRegistry build() {
            return new FrameRegistry(frames, links);
        }
    }
}
