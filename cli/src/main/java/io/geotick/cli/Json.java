package io.geotick.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** The one Jackson mapper the CLI writes and reads JSON with (thread-safe once configured). */
public final class Json {
    /** Shared, configured mapper. Field order is insertion order of the {@link ObjectNode}s we build. */
    public static final ObjectMapper MAPPER = JsonMapper.builder()
        .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
        .build();

    private Json() {
    }

    /** A new empty object node. */
    public static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    /** Compact one-line JSON text of a node. */
    public static String write(Object node) {
        try {
            return MAPPER.writeValueAsString(node);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON serialisation failed", e);
        }
    }
}
