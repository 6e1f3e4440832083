"""Writers: one per output format."""
