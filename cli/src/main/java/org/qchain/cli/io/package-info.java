/** Output files: atomic writes (temporary file, then an atomic rename) that never replace an input. */
package org.qchain.cli.io;
