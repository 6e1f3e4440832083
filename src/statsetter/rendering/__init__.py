"""Rendering: StyledText, sentence templates and table models."""
