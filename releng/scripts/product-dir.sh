#!/bin/sh
# Sourced: sets FAULTBENCH_PRODUCT to the materialized product folder of this checkout.
FAULTBENCH_PRODUCT="$FAULTBENCH_ROOT/releng/org.faultbench.product/target/products/org.faultbench.product/linux/gtk/x86_64/faultbench"
