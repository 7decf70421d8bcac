package org.tankwright.ui;

import java.awt.datatransfer.DataFlavor;
import java.io.File;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.TransferHandler;

/** Accepts design files dropped on the window and opens each. */
final class DesignDropHandler extends TransferHandler {

    private static final long serialVersionUID = 1L;
    private final transient Consumer<Path> open;

    DesignDropHandler(Consumer<Path> open) {
        this.open = open;
    }

    @Override
    public boolean canImport(TransferSupport support) {
        return support.isDataFlavorSupported(DataFlavor.javaFileListFlavor);
    }

    @Override
    public boolean importData(TransferSupport support) {
        if (!canImport(support)) {
            return false;
        }
        try {
            @SuppressWarnings("unchecked")
            List<File> dropped = (List<File>) support.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
            dropped.forEach(f -> open.accept(f.toPath()));
            return !dropped.isEmpty();
        } catch (java.awt.datatransfer.UnsupportedFlavorException | java.io.IOException e) {
            return false;
        }
    }
}
