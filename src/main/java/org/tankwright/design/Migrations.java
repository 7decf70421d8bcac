package org.tankwright.design;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * Upgrades design JSON from older format versions, one step at a time. The history of the
 * format is written in docs/design-file.md.
 */
final class Migrations {
    private Migrations() {
    }

    /** Brings {@code obj} (without its format/version keys) from {@code version} up to the current one, in place. */
    static void upgrade(JsonObject obj, int version) {
        if (version < 2) {
            v1to2(obj);
        }
    }

    /**
     * Version 1 kept the coils in a list {@code "coils": [primary, secondary]} and called the drive
     * frequency {@code "drive_frequency_Hz"}. Version 2 names them {@code primary}, {@code secondary}
     * and {@code frequency_Hz}.
     */
    private static void v1to2(JsonObject obj) {
        JsonElement coils = obj.remove("coils");
        if (coils != null && coils.isJsonArray()) {
            JsonArray a = coils.getAsJsonArray();
            if (a.size() > 0) {
                obj.add("primary", a.get(0));
            }
            if (a.size() > 1) {
                obj.add("secondary", a.get(1));
            }
        } else if (coils != null) {
            obj.add("coils", coils); // left for the reader to report
        }
        JsonElement f = obj.remove("drive_frequency_Hz");
        if (f != null && !obj.has("frequency_Hz")) {
            obj.add("frequency_Hz", f);
        }
    }
}
