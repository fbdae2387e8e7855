package dev.yoke.tui;

/**
 * Where the parts and bench editors plug into the workbench: the shortlist's edit keys call these.
 * An editor reports changes through {@link Workbench#scenarioChanged} and {@link Workbench#catalogChanged},
 * which rank again in the background.
 */
public interface EditorHooks {

    /** Opens the parts catalog editor. */
    void openParts(Workbench workbench);

    /** Opens the bench and duty profile editor. */
    void openBench(Workbench workbench);

    /** No editors in this build: the keys say so on the message line. */
    EditorHooks NONE = new EditorHooks() {
        @Override
        public void openParts(Workbench workbench) {
            workbench.showMessage("the parts editor is not available in this build");
        }

        @Override
        public void openBench(Workbench workbench) {
            workbench.showMessage("the bench editor is not available in this build");
        }
    };
}
