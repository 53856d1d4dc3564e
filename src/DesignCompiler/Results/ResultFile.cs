using System.Buffers;
using System.Text;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Text;

namespace DesignCompiler.Results;

/// <summary>
/// A returned sheet as read: its path, its bytes (their hash tells a file already recorded) and
/// its table, whether it came back as CSV text or as a workbook.
/// </summary>
public sealed record ResultFileText(string Path, byte[] Bytes, SheetTable Table);

/// <summary>
/// Reads a returned sheet, a CSV file or an .xlsx workbook, told apart by content rather than by
/// name (a workbook renamed to .csv is still read as one). Every way the file can be wrong becomes
/// a diagnostic with its place (1:1 when the file as a whole is wrong), never an exception: sheets
/// come back from spreadsheets, phones and e-mail, and some are not what they claim to be.
/// </summary>
public static class ResultFile
{
    /// <summary>
    /// A sheet of a round at the design maximum of 100 000 plots, with 40-character labels and a note on
    /// every plot, is about 12 MB; a 10 000-plot round is under 1 MB. Twice the first leaves room for long
    /// labels and notes, and keeps the time and memory to read any accepted file to seconds and well under a gigabyte.
    /// </summary>
    public const long MaxBytes = 32L * 1024 * 1024;

    public static (ResultFileText? File, IReadOnlyList<Diagnostic> Problems) Read(string path)
    {
        byte[] bytes;
        try
        {
            if (Directory.Exists(path)) return Failed(Unreadable(path, "it is a directory, not a file"));
            var info = new FileInfo(path);
            if (!info.Exists) return Failed(Unreadable(path, "no such file"));
            if (info.Length > MaxBytes)
                return Failed(Unreadable(path, SourceFiles.TooLarge(info.Length, MaxBytes, "a results sheet")));
            bytes = File.ReadAllBytes(path);
        }
        catch (UnauthorizedAccessException)
        {
            return Failed(Unreadable(path, "permission denied"));
        }
        catch (IOException e)
        {
            return Failed(Unreadable(path, e.Message));
        }
        return Decode(path, bytes);
    }

    public static (ResultFileText? File, IReadOnlyList<Diagnostic> Problems) Decode(string path, byte[] bytes)
    {
        if (XlsxSheet.LooksLikeZip(bytes))
        {
            var (workbook, problems) = XlsxSheet.Read(path, bytes);
            return workbook is null ? (null, problems) : (new ResultFileText(path, bytes, workbook), []);
        }

        var empty = new SourceText(path, "");
        if (XlsxSheet.LooksLikeLegacyOffice(bytes))
            return Failed(At(empty, 0, LedgerDiagnostics.NotAWorkbook,
                "it is an old-format (.xls) or password-protected workbook; save it as an .xlsx workbook without a password, or as 'CSV UTF-8'"));
        if (bytes.Length >= 2 && (bytes[0] == 0xFF && bytes[1] == 0xFE || bytes[0] == 0xFE && bytes[1] == 0xFF))
            return Failed(At(empty, 0, LedgerDiagnostics.NotText, "it is UTF-16 text; save the sheet as 'CSV UTF-8'"));
        if (Array.IndexOf(bytes, (byte)0) >= 0)
            return Failed(At(empty, 0, LedgerDiagnostics.NotText, "it holds binary data, not text; return the CSV sheet or the .xlsx workbook"));

        var invalid = FirstInvalidUtf8(bytes);
        if (invalid >= 0)
        {
            // Report where the bad byte is: the text before it is valid, so it can be mapped to a line and column.
            var prefix = new SourceText(path, Encoding.UTF8.GetString(bytes, 0, invalid));
            return Failed(At(prefix, prefix.Content.Length, LedgerDiagnostics.NotText,
                "it is not UTF-8 text from here on; save the sheet as 'CSV UTF-8'"));
        }

        var text = new SourceText(path, Encoding.UTF8.GetString(bytes));
        if (text.Content.Trim().Length == 0)
            return Failed(At(text, 0, LedgerDiagnostics.EmptySheet, SheetColumns.Header));
        var (table, csvProblems) = CsvSheet.Read(text);
        return table is null ? (null, csvProblems) : (new ResultFileText(path, bytes, table), []);
    }

    private static (ResultFileText?, IReadOnlyList<Diagnostic>) Failed(Diagnostic problem) => (null, [problem]);

    private static int FirstInvalidUtf8(byte[] bytes)
    {
        var span = bytes.AsSpan();
        var offset = 0;
        while (offset < span.Length)
        {
            var status = Rune.DecodeFromUtf8(span[offset..], out _, out var consumed);
            if (status != OperationStatus.Done) return offset;
            offset += consumed;
        }
        return -1;
    }

    private static Diagnostic At(SourceText text, int offset, DiagnosticDescriptor descriptor, string argument) =>
        new(descriptor, SourceLocation.In(text, new TextSpan(offset, 0)), [argument]);

    private static Diagnostic Unreadable(string path, string why) =>
        new(LedgerDiagnostics.ResultsUnreadable, SourceLocation.File(path), [why]);
}
