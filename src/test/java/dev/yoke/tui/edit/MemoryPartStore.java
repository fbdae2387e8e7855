package dev.yoke.tui.edit;

import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** A catalog store in memory, recording what the editor asked it to write. */
final class MemoryPartStore implements PartStore {

    final List<Path> files;
    final Map<String, Path> fileOfId = new LinkedHashMap<>();
    final List<PartChange> applied = new ArrayList<>();
    final List<PartChange> besides = new ArrayList<>();
    List<Motor> motors = new ArrayList<>();
    List<PowerSwitch> switches = new ArrayList<>();
    Path changedOnDisk;
    int reloads;

    MemoryPartStore(Path... files) {
        this.files = List.of(files);
    }

    MemoryPartStore motor(Motor m, Path file) {
        motors.add(m);
        fileOfId.put(m.id(), file);
        return this;
    }

    MemoryPartStore mosfet(PowerSwitch s, Path file) {
        switches.add(s);
        fileOfId.put(s.id(), file);
        return this;
    }

    @Override
    public Catalog catalog() {
        return new Catalog(motors, switches);
    }

    @Override
    public List<Path> files() {
        return files;
    }

    @Override
    public Optional<Path> fileOf(String id) {
        return Optional.ofNullable(fileOfId.get(id));
    }

    @Override
    public void apply(PartChange change) throws IOException, dev.yoke.catalog.ChangedOnDiskException {
        if (changedOnDisk != null && changedOnDisk.equals(change.file())) {
            throw new dev.yoke.catalog.ChangedOnDiskException(changedOnDisk);
        }
        applied.add(change);
        if (change instanceof PartChange.Put put) {
            if (put.replacedId() != null) {
                remove(put.replacedId());
            }
            if (put.part() instanceof Motor m) {
                motors.add(m);
                fileOfId.put(m.id(), put.file());
            } else {
                PowerSwitch s = (PowerSwitch) put.part();
                switches.add(s);
                fileOfId.put(s.id(), put.file());
            }
        } else {
            remove(((PartChange.Remove) change).id());
        }
    }

    private void remove(String id) {
        motors.removeIf(m -> m.id().equals(id));
        switches.removeIf(s -> s.id().equals(id));
        fileOfId.remove(id);
    }

    @Override
    public Kept applyBeside(PartChange change) {
        besides.add(change);
        return new Kept(change.file().resolveSibling("motors.mine.yaml"), "renamed-mine");
    }

    @Override
    public void reload() {
        reloads++;
        changedOnDisk = null;
    }
}
