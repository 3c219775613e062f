package org.sectio.viewer;

import javafx.application.Application;

/**
 * Starts the viewer: {@code sectio view [FILE]}. A separate class because a main class that itself
 * extends {@link Application} is refused on the class path ("JavaFX runtime components are missing").
 */
public final class ViewerLauncher {

    private ViewerLauncher() {
    }

    /**
     * @param args an optional geometry file (JSON); {@code --help} prints the usage
     */
    public static void main(String[] args) {
        if (args.length > 0 && (args[0].equals("--help") || args[0].equals("-h"))) {
            System.out.println("Usage: sectio view [FILE]\n"
                    + "Opens the desktop viewer on FILE (a geometry file, see docs/geometry-files.md) or on WR-90.");
            return;
        }
        if (args.length > 1) {
            System.err.println("sectio: view takes at most one geometry file, got " + args.length + " arguments");
            System.exit(2);
        }
        if (args.length == 1 && !java.nio.file.Files.isRegularFile(java.nio.file.Path.of(args[0]))) {
            System.err.println("sectio: geometry file '" + args[0] + "' not found");
            System.exit(2);
        }
        Application.launch(ViewerApplication.class, args);
    }
}
