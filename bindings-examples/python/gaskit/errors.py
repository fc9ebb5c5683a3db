"""Exceptions of gaskit: one class per status of the C library.

Every exception carries

- ``status``: the C status as an int (``gk_status``);
- ``status_name``: its C name, such as ``"GK_ERR_DOMAIN"``;
- ``argument``: the name of the Python argument at fault (``"p"``, ``"t"``, ``"fluid"``, ...)
  where it can be told, else ``None``;
- ``value``: the value of that argument, where there is one;
- ``index``: for an array call made with ``errors="raise"``, the first failed element.

The classes also derive from the built-in exception a Python programmer would expect
(``ValueError`` for bad values, ``LookupError`` for unknown names, ``ArithmeticError`` for
results out of range), so ``except ValueError`` works as usual.
"""

from ._native import LibraryError, STATUS_NAMES

__all__ = [
    "GaskitError", "ArgumentError", "DomainError", "NoSolutionError", "RangeError",
    "NotFoundError", "CompositionError", "ParseError", "LibraryError", "error_for_status",
]


class GaskitError(Exception):
    """Base class of every error a gaskit computation reports."""

    status = None
    status_name = None

    def __init__(self, message, argument=None, value=None, index=None, status=None):
        super().__init__(message)
        self.message = message
        self.argument = argument
        self.value = value
        self.index = index
        if status is not None:
            self.status = status
            self.status_name = STATUS_NAMES[status] if 0 <= status < len(STATUS_NAMES) else None

    def __str__(self):
        where = ""
        if self.argument is not None:
            where = " (argument %s" % self.argument
            if self.value is not None:
                where += " = %r" % (self.value,)
            if self.index is not None:
                where += ", element %d" % self.index
            where += ")"
        elif self.index is not None:
            where = " (element %d)" % self.index
        return "%s: %s%s" % (self.status_name, self.message, where)


class ArgumentError(GaskitError, TypeError):
    """GK_ERR_ARGUMENT: an unknown model, a unit of the wrong dimension, a bad fluid."""
    status, status_name = 1, "GK_ERR_ARGUMENT"


class DomainError(GaskitError, ValueError):
    """GK_ERR_DOMAIN: an input not finite or outside the physical domain (T <= 0 K, p <= 0)."""
    status, status_name = 2, "GK_ERR_DOMAIN"


class NoSolutionError(GaskitError, ValueError):
    """GK_ERR_NO_SOLUTION: no physical solution for these inputs."""
    status, status_name = 3, "GK_ERR_NO_SOLUTION"


class RangeError(GaskitError, ArithmeticError):
    """GK_ERR_RANGE: outside the model's validity range (e.g. a liquid), or overflow."""
    status, status_name = 4, "GK_ERR_RANGE"


class NotFoundError(GaskitError, LookupError):
    """GK_ERR_NOT_FOUND: no gas or unit with that name."""
    status, status_name = 5, "GK_ERR_NOT_FOUND"


class CompositionError(GaskitError, ValueError):
    """GK_ERR_COMPOSITION: mole fractions negative, not summing to 1, or too many."""
    status, status_name = 6, "GK_ERR_COMPOSITION"


class ParseError(GaskitError, ValueError):
    """GK_ERR_PARSE: malformed text (a quantity or a composition)."""
    status, status_name = 7, "GK_ERR_PARSE"


_CLASSES = {c.status: c for c in (ArgumentError, DomainError, NoSolutionError, RangeError,
                                  NotFoundError, CompositionError, ParseError)}


def error_for_status(status, message=None, argument=None, value=None, index=None):
    """The exception for a C status (an unknown value gives a plain :class:`GaskitError`)."""
    from ._native import native
    status = int(status)
    if message is None:
        message = native().status_string(status).decode("ascii", "replace")
    cls = _CLASSES.get(status)
    if cls is None:
        return GaskitError(message, argument, value, index, status=status)
    return cls(message, argument, value, index)
