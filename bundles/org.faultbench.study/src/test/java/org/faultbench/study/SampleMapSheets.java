package org.faultbench.study;

/** The sample map sheet (one feature of every kind) for tests in other packages. */
public final class SampleMapSheets {
    private SampleMapSheets() {
    }

    public static MapSheetFile sample() {
        return MapSheetFileFormatTest.sample();
    }
}
