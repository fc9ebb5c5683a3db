"""pytest setup: the package from this source tree unless it is installed, and the library
from GASKIT_LIBRARY (ctest and .ci/stages/python.sh set it) or the usual search."""
import os
import sys

try:
    import gaskit  # noqa: F401  (an installed package)
except ImportError:
    sys.path.insert(0, os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
