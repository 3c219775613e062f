package org.sectio.viewer;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.sectio.viewer.model.ViewerMemory;
import org.sectio.viewer.model.ViewerModel;
import org.sectio.viewer.ui.MainWindow;

/**
 * The JavaFX application: one window on the default cross-section (WR-90) or the geometry file
 * named on the command line. Started through {@link ViewerLauncher}.
 */
public final class ViewerApplication extends Application {

    private ExecutorService background;

    @Override
    public void start(Stage stage) {
        background = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "sectio-solve");
            t.setDaemon(true);
            return t;
        });
        Path memoryFile = ViewerMemory.defaultFile();
        ViewerModel model = new ViewerModel(ViewerModel.modeSolver(), background, Platform::runLater);
        MainWindow window = new MainWindow(model, ViewerMemory.load(memoryFile), memoryFile);
        window.show(stage);
        List<String> files = getParameters().getUnnamed();
        if (!files.isEmpty()) {
            window.open(Path.of(files.get(0)));
        }
    }

    @Override
    public void stop() {
        if (background != null) {
            background.shutdownNow();
        }
    }
}
