package org.faultbench.study.store;

/**
 * Bounds on an imported archive, so a damaged or hostile zip (a "zip bomb") cannot fill the disk or the folder.
 * Sizes count the bytes actually extracted, not the sizes the archive declares.
 *
 * @param maxEntries most files and folders an archive may hold
 * @param maxTotalBytes most bytes all files together may extract to
 */
public record ArchiveLimits(int maxEntries, long maxTotalBytes) {
    /** 20,000 entries and 4 GiB: far above a workspace with scans and grids, far below a full disk. */
    public static final ArchiveLimits DEFAULT = new ArchiveLimits(20_000, 4L << 30);

    public ArchiveLimits {
        if (maxEntries < 1 || maxTotalBytes < 1) {
            throw new IllegalArgumentException("archive limits must be positive, were " + maxEntries + " entries and "
                    + maxTotalBytes + " bytes");
        }
    }
}
