package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.yoke.engine.SyntheticParts;
import dev.yoke.model.Catalog;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The scale harness's writer: a generated catalog written as YAML loads back as the very same records. */
class GeneratedCatalogTest {

    @TempDir
    Path folder;

    @Test
    void generatedCatalogWrittenAsYamlLoadsBackEqual() throws Exception {
        Catalog catalog = SyntheticParts.catalog(300, 2600, 7L);
        CatalogScaleBench.write(catalog, folder);
        LoadedCatalog loaded = CatalogLoader.load(folder);
        assertEquals(catalog.motors(), loaded.catalog().motors());
        assertEquals(catalog.switches(), loaded.catalog().switches());
        assertEquals(3, loaded.files().size(), "2,600 switches fill two files of 2,500");
    }
}
