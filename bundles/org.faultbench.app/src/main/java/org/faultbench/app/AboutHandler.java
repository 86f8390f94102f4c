package org.faultbench.app;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.ui.handlers.HandlerUtil;

/** Help > About Faultbench: product version and the decision cautions. */
public class AboutHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) {
        MessageDialog.openInformation(HandlerUtil.getActiveShell(event), "About " + ProductInfo.PRODUCT_NAME,
                ProductInfo.aboutText());
        return null;
    }
}
