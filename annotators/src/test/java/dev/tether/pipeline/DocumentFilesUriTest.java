package dev.tether.pipeline;

import org.junit.jupiter.api.Test;

import java.io.IOException;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Which inputs are file system URIs (read only on Spark) and which are local paths. The scheme syntax is RFC 3986,
 * section 3.1: a letter, then letters, digits, "+", "-" or "."; a one-letter scheme is taken for a Windows drive.
 */
class DocumentFilesUriTest {
    @Test
    void schemesAreUrisAndPathsAreNot() {
        for (String uri : new String[] {"hdfs://namenode:8020/ferry/logs", "s3a://ferry-archive/logs/2025", "file:///shared/logs",
                "file:/shared/logs", "viewfs://cluster/logs", "abfs+x://c@a.dfs.example/logs"}) {
            assertTrue(DocumentFiles.isFileSystemUri(uri), uri);
        }
        for (String path : new String[] {"/shared/logs", "logs/2025", "./hdfs://x", "C:\\logs", "C:/logs", "", ":x",
                "2025:logs", "-x:logs", "deck logs"}) {
            assertFalse(DocumentFiles.isFileSystemUri(path), path);
        }
    }

    @Test
    void aUriWhereOnlyLocalPathsAreReadIsRefusedSayingWhatToDo() {
        IOException e = assertThrows(IOException.class, () -> DocumentFiles.requireLocal("hdfs://namenode/logs", "--raw"));
        assertTrue(e.getMessage().contains("--raw hdfs://namenode/logs") && e.getMessage().contains("--spark"), e.getMessage());
        assertDoesNotThrow(() -> DocumentFiles.requireLocal("/shared/logs", "--raw"));
    }
}
