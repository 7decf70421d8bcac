package org.tankwright.ui;

import java.awt.Component;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import javax.imageio.ImageIO;
import javax.swing.JFrame;

/** Renders a window's whole content (menus, panes, status bar) into a PNG. */
public final class Snapshot {

    private Snapshot() {
    }

    /** Paints {@code frame}'s root pane into an image (call on the event thread, after layout). */
    public static BufferedImage capture(JFrame frame) {
        Component root = frame.getRootPane();
        BufferedImage img = new BufferedImage(root.getWidth(), root.getHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            root.paintAll(g);
        } finally {
            g.dispose();
        }
        return img;
    }

    /** Writes {@code image} to {@code file} as PNG (a temporary file, then a move). */
    public static void writePng(BufferedImage image, Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, ".snapshot", ".png");
        try {
            if (!ImageIO.write(image, "png", tmp.toFile())) {
                throw new IOException("no PNG writer available");
            }
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
