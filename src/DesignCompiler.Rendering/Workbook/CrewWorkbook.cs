using System.Globalization;
using DesignCompiler.Binding;
using DesignCompiler.Rendering.Models;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;

namespace DesignCompiler.Rendering.Workbook;

/// <summary>
/// The crew sheet as an .xlsx workbook (ECMA-376, written with the Open XML SDK): one worksheet
/// per block, in design order. Relationship ids are given rather than generated (the SDK makes
/// random ones) and the zip is rewritten without save times, so the same round gives the same
/// bytes on every run, machine and culture.
/// </summary>
public static class CrewWorkbook
{
    public static byte[] Build(SheetModel model, OutcomeSpec outcome)
    {
        using var buffer = new MemoryStream();
        using (var document = SpreadsheetDocument.Create(buffer, DocumentFormat.OpenXml.SpreadsheetDocumentType.Workbook))
        {
            var workbookPart = document.AddWorkbookPart();
            document.ChangeIdOfPart(workbookPart, "rId1");
            var names = SheetNames.For(model.Blocks.Select(b => b.Name));
            var sheets = new Sheets();
            var printTitles = new DefinedNames();
            for (var j = 0; j < model.Blocks.Count; j++)
            {
                var id = "rId" + (j + 1).ToString(CultureInfo.InvariantCulture);
                var part = workbookPart.AddNewPart<WorksheetPart>(id);
                part.Worksheet = BlockWorksheet.Build(model, model.Blocks[j], outcome);
                sheets.Append(new Sheet { Name = names[j], SheetId = (uint)(j + 1), Id = id });
                var header = BlockWorksheet.HeaderRow.ToString(CultureInfo.InvariantCulture);
                printTitles.Append(new DefinedName("'" + names[j].Replace("'", "''") + "'!$" + header + ":$" + header)
                {
                    Name = "_xlnm.Print_Titles", LocalSheetId = (uint)j,
                });
            }
            var styles = workbookPart.AddNewPart<WorkbookStylesPart>("rId" + (model.Blocks.Count + 1).ToString(CultureInfo.InvariantCulture));
            styles.Stylesheet = WorkbookStyles.Create();
            workbookPart.Workbook = new DocumentFormat.OpenXml.Spreadsheet.Workbook(
                new BookViews(new WorkbookView { ActiveTab = 0 }), sheets, printTitles);
        }
        return DeterministicZip.Normalise(buffer.ToArray());
    }
}
